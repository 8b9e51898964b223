// `npm run bench:registry`: the sample list at 100,000 samples. Starts its own PostgreSQL, object
// store and mail spool under a temporary folder (as `npm test` does), migrates, seeds the demo
// people and places, generates 100,000 samples, starts the built server, and times
//   the endpoint: GET /api/samples with a search term and a filter, signed in, over HTTP;
//   the floor:    the same SQL (the list route's own query builder) run straight through Knex,
// interleaved in the same run. Target: endpoint p95 ≤ 1.5 × floor p95, and under 50 ms.
import type { Knex } from 'knex'
import { percentile, runBench, withStack } from './lib/stack'
import { SampleBody, SampleListQuery } from '../shared/schemas/samples'
import { samplePage } from '../server/utils/sample-list'
import { componentRows, sampleColumns } from '../server/utils/sample-columns'

const SAMPLES = 100_000
const ROUNDS = 400
const WARM_UP = 60
const QUERY = { q: 'nickel', form: 'foil', sort: '-code', page: '1', pageSize: '25' }
const TARGET_RATIO = 1.5
const TARGET_MS = 50

// A small deterministic generator, so every run measures the same stock.
let state = 20261203
function rand(): number {
  state = (state * 1664525 + 1013904223) % 2 ** 32
  return state / 2 ** 32
}
const pick = <T>(list: readonly T[]): T => list[Math.floor(rand() * list.length)]!

const ELEMENTS: [number, string, number | null, number][] = [
  // Z, name, an isotope often enriched (or null), bulk density g/cm³ (CRC Handbook, from memory)
  [6, 'Carbon', 13, 2.0], [13, 'Aluminium', null, 2.7], [20, 'Calcium', 48, 1.55], [22, 'Titanium', 50, 4.506], [26, 'Iron', 54, 7.874],
  [28, 'Nickel', 58, 8.908], [29, 'Copper', 65, 8.96], [40, 'Zirconium', 96, 6.52], [50, 'Tin', 116, 7.287], [62, 'Samarium', 154, 7.52],
  [73, 'Tantalum', null, 16.69], [79, 'Gold', null, 19.32], [82, 'Lead', 208, 11.34], [42, 'Molybdenum', 92, 10.28], [46, 'Palladium', 108, 12.02],
  [64, 'Gadolinium', 160, 7.9], [68, 'Erbium', 170, 9.07], [74, 'Tungsten', 186, 19.25], [78, 'Platinum', 194, 21.45], [83, 'Bismuth', null, 9.78],
]
const FORMS = ['foil', 'foil', 'foil', 'powder', 'wire', 'sputter_cathode', 'stripper_foil', 'other'] as const
const STATUSES = ['available', 'available', 'available', 'in_use', 'quarantined', 'depleted'] as const
const SUPPLIERS = ['Quillmoor Isotopes', 'Veltane Thin Films', 'Brackenfold Metals', 'Aldermere Enrichment', 'Tolvane Carbon', 'Harlow Fen Targets']

function generated(i: number, places: string[]) {
  const [z, name, isotope, density] = pick(ELEMENTS)
  const enriched = isotope !== null && rand() < 0.4
  const form = pick(FORMS)
  const day = (offset: number) => new Date(Date.UTC(2026, 0, 1) + offset * 86_400_000).toISOString().slice(0, 10)
  const received = -Math.floor(rand() * 1500)
  return SampleBody.parse({
    name: `${enriched ? `${isotope}${name.slice(0, 2)}` : name} ${form.replace('_', ' ')} no. ${i}`,
    material: `${name}${enriched ? `, enriched in ${isotope}` : ''}`,
    form,
    status: pick(STATUSES),
    arealDensity: Math.round(10 + rand() * 2000),
    bulkDensity: density,
    supplier: pick(SUPPLIERS),
    lot: `L${Math.floor(rand() * 90000 + 10000)}`,
    receivedOn: day(received),
    recertifyBy: day(received + 365 + Math.floor(rand() * 900)),
    locationId: pick(places),
    components: [{ z, massNumber: enriched ? isotope : null, fraction: 1, basis: 'atom', enrichmentPercent: enriched ? 95 + Math.floor(rand() * 49) / 10 : null }],
  })
}

async function generate(db: Knex): Promise<void> {
  const places = (await db('locations').where({ kind: 'shelf' }).select('id')).map((r) => r.id as string)
  const started = performance.now()
  for (let done = 0; done < SAMPLES; done += 1000) {
    const batch = Array.from({ length: 1000 }, (_, k) => generated(done + k, places))
    const ids = await db('samples').insert(batch.map(sampleColumns)).returning('id')
    await db('sample_components').insert(batch.flatMap((s, k) => componentRows(ids[k]!.id, s)))
  }
  await db.raw('analyze')
  console.log(`Generated ${SAMPLES.toLocaleString('en')} samples in ${((performance.now() - started) / 1000).toFixed(1)} s`)
}

const p95 = (times: number[]) => percentile(times, 95)

async function main(): Promise<number> {
  return withStack(async ({ base, db, cookieOf }) => {
    const cookie = await cookieOf('manager')
    const url = `${base}/api/samples?${new URLSearchParams(QUERY)}`
    const params = SampleListQuery.parse(QUERY)

    const endpoint = async () => {
      const t = performance.now()
      const r = await fetch(url, { headers: { cookie } })
      const body = (await r.json()) as { total: number; items: unknown[] }
      if (r.status !== 200) throw new Error(`the list answered ${r.status}`)
      return { ms: performance.now() - t, total: body.total }
    }
    const floor = async () => {
      const t = performance.now()
      const { total } = await samplePage(db, params)
      return { ms: performance.now() - t, total }
    }
    for (let i = 0; i < WARM_UP; i++) {
      await endpoint()
      await floor()
    }
    const times = { endpoint: [] as number[], floor: [] as number[] }
    const totals = new Set<number>()
    for (let i = 0; i < ROUNDS; i++) {
      // alternate the order so neither side always runs on a cache the other just warmed
      const order = i % 2 ? [endpoint, floor] : [floor, endpoint]
      for (const run of order) {
        const r = await run()
        times[run === endpoint ? 'endpoint' : 'floor'].push(r.ms)
        totals.add(r.total)
      }
    }
    if (totals.size !== 1) throw new Error('the endpoint and the floor found different totals')
    const e = p95(times.endpoint)
    const f = p95(times.floor)
    const ratio = e / f
    const ok = ratio <= TARGET_RATIO && e < TARGET_MS
    console.log(`
Sample list at ${SAMPLES.toLocaleString('en')} samples: q=${QUERY.q}, form=${QUERY.form}, sort=${QUERY.sort}, pageSize=${QUERY.pageSize} (${[...totals][0]} matches), ${ROUNDS} rounds
  endpoint (HTTP, signed in)  p95 ${e.toFixed(2)} ms   median ${[...times.endpoint].sort((a, b) => a - b)[ROUNDS >> 1]!.toFixed(2)} ms
  floor (same SQL via Knex)   p95 ${f.toFixed(2)} ms   median ${[...times.floor].sort((a, b) => a - b)[ROUNDS >> 1]!.toFixed(2)} ms
  ratio endpoint / floor      ${ratio.toFixed(2)}   (target ≤ ${TARGET_RATIO})
  endpoint p95                ${e.toFixed(2)} ms (target < ${TARGET_MS} ms)
  ${ok ? 'PASS' : 'FAIL'}`)
    return ok ? 0 : 1
  }, generate)
}

runBench(main)
