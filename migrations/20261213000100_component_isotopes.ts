import type { Knex } from 'knex'

// A supplier's full isotopic analysis of one component: one row per isotope with its atom
// fraction in % and standard uncertainty in %. Goes with its component (components are rewritten
// whole on every edit, so the rows follow by cascade).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('sample_component_isotopes', (t) => {
    t.bigIncrements('id')
    t.bigInteger('component_id').notNullable().references('id').inTable('sample_components').onDelete('CASCADE')
    t.smallint('position').notNullable()
    t.smallint('mass_number').notNullable()
    t.double('atom_pct').notNullable()
    t.double('atom_unc_pct')
    t.unique(['component_id', 'mass_number'])
  })
  await knex.raw(`
    alter table sample_component_isotopes
      add constraint sample_component_isotopes_mass_check check (mass_number between 1 and 300),
      add constraint sample_component_isotopes_pct_check check (atom_pct >= 0 and atom_pct <= 100),
      add constraint sample_component_isotopes_unc_check check (atom_unc_pct is null or atom_unc_pct >= 0)
  `)
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('sample_component_isotopes')
}
