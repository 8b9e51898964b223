import type { Knex } from 'knex'

// What a sample is made of: one row per element (natural) or isotope, with its fraction of the
// sample on an atom or mass basis and, for an isotope, its enrichment within the element.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('sample_components', (t) => {
    t.bigIncrements('id')
    t.uuid('sample_id').notNullable().references('id').inTable('samples').onDelete('CASCADE')
    t.smallint('position').notNullable()
    t.smallint('z').notNullable()
    t.smallint('mass_number')
    t.double('fraction').notNullable()
    t.text('fraction_basis').notNullable()
    t.double('enrichment_pct')
    t.double('fraction_unc')
    t.double('enrichment_unc_pct')
    t.index(['sample_id'])
  })
  await knex.raw(`
    alter table sample_components
      add constraint sample_components_z_check check (z between 1 and 118),
      add constraint sample_components_fraction_check check (fraction > 0 and fraction <= 1),
      add constraint sample_components_basis_check check (fraction_basis in ('atom', 'mass')),
      add constraint sample_components_enrichment_check check (enrichment_pct is null or (mass_number is not null and enrichment_pct > 0 and enrichment_pct <= 100)),
      add constraint sample_components_unique unique nulls not distinct (sample_id, z, mass_number)
  `)
  // The element and isotope filters look components up by (z, mass number) first.
  await knex.raw('create index sample_components_nuclide on sample_components (z, mass_number, sample_id)')
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('sample_components')
}
