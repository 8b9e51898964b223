import type { Knex } from 'knex'

// The samples. The code (S-YYYY-NNNNNN) comes from a sequence: a number once handed out is
// never handed out again, even when the insert that drew it rolls back. The year is the year of
// registration; the serial runs on across years and grows past six digits rather than wrap.
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    create sequence sample_code_seq start 1;
    create function next_sample_code() returns text language plpgsql volatile as $$
    declare n bigint := nextval('sample_code_seq');
    begin
      return 'S-' || to_char(now(), 'YYYY') || '-' || lpad(n::text, greatest(6, length(n::text)), '0');
    end $$;
  `)
  await knex.schema.createTable('samples', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.text('code').notNullable().unique().defaultTo(knex.raw('next_sample_code()'))
    t.text('name').notNullable()
    t.text('material').notNullable()
    t.text('formula')
    t.text('form').notNullable()
    t.text('status').notNullable().defaultTo('available')
    t.double('areal_density_ug_cm2')
    t.double('areal_density_unc_ug_cm2')
    t.double('thickness_nm')
    t.double('bulk_density_g_cm3')
    t.double('mass_mg')
    t.text('backing')
    t.text('supplier')
    t.text('lot')
    t.date('received_on')
    t.date('recertify_by')
    t.uuid('location_id').references('id').inTable('locations').onDelete('RESTRICT')
    t.specificType('hazard_statements', 'text[]').notNullable().defaultTo('{}')
    // The cautions (radioactive, toxic, …) the shared classifier finds, stored on every write so
    // the list can filter on them.
    t.specificType('hazard_kinds', 'text[]').notNullable().defaultTo('{}')
    t.boolean('radioactive').notNullable().defaultTo(false)
    t.text('nuclide')
    t.double('activity_bq')
    t.text('notes')
    t.integer('version').notNullable().defaultTo(1)
    t.text('created_by').references('id').inTable('users')
    t.text('updated_by').references('id').inTable('users')
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.timestamp('retired_at', { useTz: true })
    t.index(['location_id'])
    t.index(['recertify_by'])
    t.index(['status'])
    t.index(['updated_at'])
  })
  await knex.raw(`
    alter table samples
      add constraint samples_form_check check (form in ('foil', 'powder', 'wire', 'sputter_cathode', 'gas_cylinder', 'stripper_foil', 'solution', 'other')),
      add constraint samples_status_check check (status in ('quarantined', 'available', 'in_use', 'depleted', 'retired')),
      add constraint samples_retired_check check ((status = 'retired') = (retired_at is not null)),
      add constraint samples_radioactive_check check (radioactive or (nuclide is null and activity_bq is null)),
      add constraint samples_positive_check check (
        (areal_density_ug_cm2 is null or areal_density_ug_cm2 > 0) and (areal_density_unc_ug_cm2 is null or areal_density_unc_ug_cm2 >= 0)
        and (thickness_nm is null or thickness_nm > 0) and (bulk_density_g_cm3 is null or bulk_density_g_cm3 > 0)
        and (mass_mg is null or mass_mg >= 0) and (activity_bq is null or activity_bq > 0))
  `)
  await knex.raw('create index samples_hazard_kinds on samples using gin (hazard_kinds)')
  await knex.raw('create index samples_hazard_statements on samples using gin (hazard_statements)')
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('samples')
  await knex.raw('drop function if exists next_sample_code()')
  await knex.raw('drop sequence if exists sample_code_seq')
}
