import { randomUUID } from 'node:crypto'
import { hash } from '@node-rs/argon2'
import type { Knex } from 'knex'

// The demo laboratory is fictional: Larchmere Ion Beam Laboratory, its people and its
// addresses (.example is reserved for examples) are invented. These sign-ins are demo-only.
export const DEMO_PEOPLE = [
  { role: 'manager', name: 'Maren Okafor', email: 'manager@larchmere-lab.example', password: 'demo-manager-2026' },
  { role: 'scientist', name: 'Tobias Vellacott', email: 'scientist@larchmere-lab.example', password: 'demo-scientist-2026' },
  { role: 'technician', name: 'Priya Lindqvist', email: 'technician@larchmere-lab.example', password: 'demo-technician-2026' },
  { role: 'auditor', name: 'Jonah Achterberg', email: 'auditor@larchmere-lab.example', password: 'demo-auditor-2026' },
] as const

export async function seed(knex: Knex): Promise<void> {
  for (const person of DEMO_PEOPLE) {
    const exists = await knex('users').whereRaw('lower(email) = ?', [person.email]).first()
    if (exists) continue
    const id = randomUUID()
    await knex('users').insert({ id, email: person.email, name: person.name, role: person.role, password_hash: await hash(person.password, { algorithm: 2 }) })
    await knex('audit_log').insert({ action: 'user.seeded', entity_type: 'user', entity_id: id, after: JSON.stringify({ email: person.email, role: person.role }) })
  }
}
