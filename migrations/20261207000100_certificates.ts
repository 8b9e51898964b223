import type { Knex } from 'knex'

// Certificates. The number (C-YYYY-NNNNNN) comes from a sequence, so a number once drawn is never
// drawn again, even when the transaction that drew it rolls back. A certificate never changes
// once issued: the database refuses any change to what it says, and allows only the two
// status moves (issued → superseded, issued → revoked), each once, with who, when and why.
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    create sequence certificate_number_seq start 1;
    create function next_certificate_number() returns text language plpgsql volatile as $$
    declare n bigint := nextval('certificate_number_seq');
    begin
      return 'C-' || to_char(now(), 'YYYY') || '-' || lpad(n::text, greatest(6, length(n::text)), '0');
    end $$;
  `)
  await knex.schema.createTable('certificates', (t) => {
    t.uuid('id').primary()
    t.text('number').notNullable().unique()
    t.text('subject_type').notNullable()
    t.uuid('subject_id').notNullable()
    t.text('subject_label').notNullable()
    t.integer('version').notNullable()
    t.text('status').notNullable().defaultTo('issued')
    t.jsonb('payload').notNullable()
    t.text('sha256').notNullable()
    t.text('object_key').notNullable().unique()
    t.text('pdf_sha256').notNullable()
    t.integer('pdf_bytes').notNullable()
    t.text('issued_by').notNullable().references('id').inTable('users')
    t.timestamp('issued_at', { useTz: true }).notNullable()
    t.date('valid_until')
    t.uuid('supersedes_id').references('id').inTable('certificates')
    t.text('correction_reason')
    t.uuid('superseded_by').references('id').inTable('certificates').deferrable('deferred')
    t.timestamp('superseded_at', { useTz: true })
    t.timestamp('revoked_at', { useTz: true })
    t.text('revoked_by').references('id').inTable('users')
    t.text('revoke_reason')
    t.unique(['subject_type', 'subject_id', 'version'])
    t.index(['subject_type', 'subject_id'])
    t.index(['issued_at'])
    t.index(['status'])
  })
  await knex.raw(`
    alter table certificates
      add constraint certificates_subject_type_check check (subject_type in ('sample', 'species')),
      add constraint certificates_status_check check (status in ('issued', 'superseded', 'revoked')),
      add constraint certificates_version_check check (version >= 1),
      add constraint certificates_sha256_check check (sha256 ~ '^[0-9a-f]{64}$' and pdf_sha256 ~ '^[0-9a-f]{64}$'),
      add constraint certificates_superseded_check check ((status = 'superseded') = (superseded_by is not null and superseded_at is not null)),
      add constraint certificates_revoked_check check ((status = 'revoked') = (revoked_at is not null and revoked_by is not null and revoke_reason is not null)),
      add constraint certificates_correction_check check ((supersedes_id is null) = (correction_reason is null));
    -- At most one current certificate per subject.
    create unique index certificates_one_current on certificates (subject_type, subject_id) where status = 'issued';

    create function certificates_guard() returns trigger language plpgsql as $$
    begin
      if tg_op in ('DELETE', 'TRUNCATE') then
        raise exception 'certificates are never deleted' using errcode = 'insufficient_privilege';
      end if;
      if (new.id, new.number, new.subject_type, new.subject_id, new.subject_label, new.version, new.payload, new.sha256,
          new.object_key, new.pdf_sha256, new.pdf_bytes, new.issued_by, new.issued_at, new.valid_until, new.supersedes_id, new.correction_reason)
         is distinct from
         (old.id, old.number, old.subject_type, old.subject_id, old.subject_label, old.version, old.payload, old.sha256,
          old.object_key, old.pdf_sha256, old.pdf_bytes, old.issued_by, old.issued_at, old.valid_until, old.supersedes_id, old.correction_reason) then
        raise exception 'an issued certificate never changes' using errcode = 'insufficient_privilege';
      end if;
      if old.status <> 'issued' and (new.status, new.superseded_by, new.superseded_at, new.revoked_at, new.revoked_by, new.revoke_reason)
         is distinct from (old.status, old.superseded_by, old.superseded_at, old.revoked_at, old.revoked_by, old.revoke_reason) then
        raise exception 'a superseded or revoked certificate stays as it is' using errcode = 'insufficient_privilege';
      end if;
      return new;
    end $$;
    create trigger certificates_guard before update or delete on certificates
      for each row execute function certificates_guard();
    create trigger certificates_no_truncate before truncate on certificates
      for each statement execute function certificates_guard();
  `)
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('drop table if exists certificates')
  await knex.raw('drop function if exists certificates_guard()')
  await knex.raw('drop function if exists next_certificate_number()')
  await knex.raw('drop sequence if exists certificate_number_seq')
}
