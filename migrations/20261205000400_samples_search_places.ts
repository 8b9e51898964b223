import type { Knex } from 'knex'

// The search column, second form. A search term naming a storage place (its code or name, or
// those of a place around it) must find the samples kept there, in the same single indexed
// LIKE as the other fields: an OR with a separate place lookup made PostgreSQL scan every row
// (~40 ms at 100,000 samples instead of ~10). A generated column cannot read the locations
// table, so the column becomes a plain one kept by triggers: on every sample write, and for the
// samples inside a place when that place changes.
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    drop index if exists locations_search_trgm;
    drop index if exists samples_search_trgm;
    alter table samples drop column search_text;
  `)
  await knex.raw(`
    alter table samples add column search_text text not null default '';

    create function samples_search_text() returns trigger language plpgsql as $$
    begin
      new.search_text := lower(concat_ws(' ', new.code, new.name, new.material, new.formula, new.supplier, new.lot,
        (with recursive up as (
           select id, parent_id, code, name, 0 as depth from locations where id = new.location_id
           union all
           select p.id, p.parent_id, p.code, p.name, up.depth + 1 from locations p join up on p.id = up.parent_id where up.depth < 10)
         select string_agg(code || ' ' || name, ' ') from up)));
      return new;
    end $$;
    create trigger samples_search_text before insert or update of code, name, material, formula, supplier, lot, location_id on samples
      for each row execute function samples_search_text();

    create function locations_refresh_search() returns trigger language plpgsql as $$
    begin
      update samples set location_id = location_id where location_id in (
        with recursive down as (
          select id, 0 as depth from locations where id = new.id
          union all
          select c.id, down.depth + 1 from locations c join down on c.parent_id = down.id where down.depth < 10)
        select id from down);
      return null;
    end $$;
    create trigger locations_refresh_search after update of code, name, parent_id on locations
      for each row execute function locations_refresh_search();

    -- fill the column for samples that exist already (the trigger does the work)
    update samples set location_id = location_id;
    create index samples_search_trgm on samples using gin (search_text gin_trgm_ops);
  `)
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw(`
    drop trigger if exists locations_refresh_search on locations;
    drop function if exists locations_refresh_search();
    drop trigger if exists samples_search_text on samples;
    drop function if exists samples_search_text();
    alter table samples drop column if exists search_text;
    alter table samples add column search_text text generated always as (
      lower(code || ' ' || name || ' ' || material || ' ' || coalesce(formula, '') || ' ' || coalesce(supplier, '') || ' ' || coalesce(lot, ''))
    ) stored;
    create index samples_search_trgm on samples using gin (search_text gin_trgm_ops);
    create index locations_search_trgm on locations using gin ((lower(code || ' ' || name)) gin_trgm_ops);
  `)
}
