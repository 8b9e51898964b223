/**
 * Regenerates shared/physics/data/nist-asd-detail.ts: what NIST ASD says about each ionisation
 * energy beyond the number pymatgen carries — its stated uncertainty, whether it is measured,
 * semi-empirical or theoretical, and the ground shells of the ion it belongs to.
 *
 *   tsx scripts/reference/build-nist-asd-detail.ts PATH/TO/ionization_energies.csv [--check]
 *
 * Input: the comma-separated export of the NIST ASD "Ground States and Ionization Energies" table
 * (ASD ver. 5.12, A. Kramida, Yu. Ralchenko, J. Reader and NIST ASD Team, 2024; exported
 * 2026-03-28), columns "At. Num, Ion Charge, Ground Shells, Ground Level, Ionization Energy (eV),
 * Uncertainty (eV)", as the public repository tardis-sn/carsus-data-nist keeps it in
 * nist_data/ionization_energies.csv. Only the npm registry and Debian are reachable from this
 * project's machines, so the generated file is committed; this script documents and checks how.
 *
 * Each value is compared with the one the engine already uses (data/nist-asd.ts, via pymatgen
 * 2022.11.7). Where they agree the uncertainty belongs to the engine's reference value; where
 * ASD has since revised a value, the newer value is kept beside it (asdEv), so that nothing
 * claims an uncertainty for a number it was not stated for. Rows the engine has no value for are
 * skipped. --check compares with the committed file and exits 1 when it differs.
 */
import { readFileSync, writeFileSync } from 'node:fs'
import { parse as parseCsv } from 'csv-parse/sync'
import { fileURLToPath } from 'node:url'
import { NIST_ASD_ROWS } from '../../shared/physics/data/nist-asd'

const target = fileURLToPath(new URL('../../shared/physics/data/nist-asd-detail.ts', import.meta.url))
const input = process.argv[2]
if (!input) {
  console.error('usage: tsx scripts/reference/build-nist-asd-detail.ts PATH/TO/ionization_energies.csv [--check]')
  process.exit(2)
}

/** ASD writes odd parity as '*' and half-integer J in angle brackets: 4I*<15/2> → 4I°15/2. */
function level(text: string): string {
  return text.trim().replace(/\*/g, '°').replace(/<([^>]*)>/g, '$1')
}

/** 0 measured, 1 semi-empirical ([…]), 2 theoretical ((…)) — ASD's own marks. */
type Kind = 0 | 1 | 2

interface Row {
  z: number
  charge: number
  shells: string
  /** ASD's ground level in the engine's notation ('4I°15/2', '(0,3/2)°3/2'); '' where ASD gives none */
  level: string
  eV: number
  kind: Kind
  uncertaintyEv: number | null
}

function readExport(text: string): Row[] {
  const rows: Row[] = []
  const seen = new Set<string>()
  // fields may be quoted and hold commas: "(0,3/2)*<3/2>"
  const records = parseCsv(text, { skip_empty_lines: true, relax_column_count: true }) as string[][]
  for (const [index, f] of records.entries()) {
    if (f[0]?.startsWith('At. Num')) continue
    const line = f.join(',')
    if (f.length !== 6) throw new Error(`line ${index + 1}: ${f.length} fields, expected 6: ${line}`)
    const [zText, chargeText, shells, levelText, energyText, uncertaintyText] = f
    const z = Number(zText)
    const charge = Number(chargeText.replace(/^\+/, ''))
    if (!Number.isInteger(z) || !Number.isInteger(charge) || charge < 0 || charge >= z) throw new Error(`line ${index + 1}: bad Z or charge: ${line}`)
    const key = `${z}:${charge}`
    if (seen.has(key)) throw new Error(`line ${index + 1}: ${key} listed twice`)
    seen.add(key)
    const energy = energyText.trim()
    if (energy === '') continue
    const m = /^([([]?)(\d+(?:\.\d+)?)([)\]]?)$/.exec(energy)
    if (!m || (m[1] === '(' && m[3] !== ')') || (m[1] === '[' && m[3] !== ']') || (m[1] === '' && m[3] !== '')) {
      throw new Error(`line ${index + 1}: unreadable energy "${energy}"`)
    }
    const kind: Kind = m[1] === '[' ? 1 : m[1] === '(' ? 2 : 0
    const u = uncertaintyText.trim()
    if (u !== '' && !/^\d+(?:\.\d+)?$/.test(u)) throw new Error(`line ${index + 1}: unreadable uncertainty "${u}"`)
    rows.push({ z, charge, shells: shells.trim(), level: level(levelText), eV: Number(m[2]), kind, uncertaintyEv: u === '' ? null : Number(u) })
  }
  return rows
}

const rows = readExport(readFileSync(input, 'utf8'))
const byZ = new Map<number, Map<number, Row>>()
for (const r of rows) {
  if (!byZ.has(r.z)) byZ.set(r.z, new Map())
  byZ.get(r.z)!.set(r.charge, r)
}

let same = 0
let revised = 0
let missing = 0
const revisedList: string[] = []
const lines: string[] = []
for (let z = 1; z <= NIST_ASD_ROWS.length; z++) {
  const ours = NIST_ASD_ROWS[z - 1][4]
  const cells: string[] = []
  for (let charge = 0; charge < ours.length; charge++) {
    const engineEv = ours[charge]
    const r = byZ.get(z)?.get(charge)
    if (engineEv === null || engineEv === undefined || !r) {
      if (engineEv !== null && engineEv !== undefined) missing++
      cells.push('null')
      continue
    }
    // pymatgen stores the printed decimal; equal within a part in 1e9 is the same value
    const agrees = Math.abs(r.eV - engineEv) <= 1e-9 * Math.max(1, engineEv)
    if (agrees) same++
    else {
      revised++
      revisedList.push(`${z}:${charge} ${engineEv} → ${r.eV}`)
    }
    cells.push(`[${r.uncertaintyEv ?? 'null'}, ${r.kind}, '${r.shells}', ${agrees ? 'null' : r.eV}, '${r.level}']`)
  }
  lines.push(`  [${cells.join(', ')}], // ${z}`)
}

const text = `/**
 * Generated by scripts/reference/build-nist-asd-detail.ts — do not edit by hand.
 *
 * NIST Atomic Spectra Database, ver. 5.12 (A. Kramida, Yu. Ralchenko, J. Reader and NIST ASD
 * Team, 2024), "Ground States and Ionization Energies", export of 2026-03-28 as kept in the
 * public repository tardis-sn/carsus-data-nist (nist_data/ionization_energies.csv).
 *
 * Per element (index Z − 1), per charge of the ion being ionised (index = charge, as in
 * data/nist-asd.ts): null where the engine has no reference value or the export none, else
 * [stated uncertainty in eV (null: not stated), 0 measured | 1 semi-empirical (ASD prints it in
 * [ ]) | 2 theoretical (ASD prints it in ( )), the ion's ground shells as ASD writes them,
 * ASD 5.12's value where it differs from data/nist-asd.ts's (null where they agree, so the
 * uncertainty is that of the engine's reference value), the ground level as ASD gives it with
 * '*' written ° and J out of its angle brackets ('' where ASD gives none; '°' alone where it gives
 * only the parity)].
 * ${same} values agree with data/nist-asd.ts, ${revised} were revised since, ${missing} have no row in the export.
 */

export const NIST_ASD_DETAIL_SOURCE =
  'NIST ASD ver. 5.12 (Kramida, Ralchenko, Reader and NIST ASD Team, 2024), ground states and ionization energies'

/** [uncertainty eV | null, 0 measured | 1 semi-empirical | 2 theoretical, ground shells, ASD 5.12 eV where revised, ground level] */
export type NistAsdDetail = readonly [number | null, 0 | 1 | 2, string, number | null, string]

export const NIST_ASD_DETAIL: readonly (readonly (NistAsdDetail | null)[])[] = [
${lines.join('\n')}
]
`

console.log(`${rows.length} rows read; ${same} agree with data/nist-asd.ts, ${revised} revised, ${missing} engine values without a row`)
if (revisedList.length) console.log(`revised: ${revisedList.slice(0, 40).join('; ')}${revisedList.length > 40 ? ' …' : ''}`)
if (process.argv.includes('--check')) {
  const current = readFileSync(target, 'utf8')
  console.log(current === text ? 'the committed file matches' : 'the committed file differs')
  process.exit(current === text ? 0 : 1)
}
writeFileSync(target, text)
console.log(`wrote ${target}`)
