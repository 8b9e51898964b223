import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { everyone, type Client } from '../support/api'
import { readFileSync } from 'node:fs'
import { PNG } from 'pngjs'
import { decodeAll } from '../../shared/labels/multi-decode'
import { labelContent } from '../../shared/labels/content'
import { labelsDocument } from '../../server/pdf/labels'
import { renderPdf } from '../../server/pdf/fonts'
import { preparePackageFonts } from '../../server/pdf/package-fonts'
import { closeTestDb, testDb } from '../support/db'
import { createSample } from '../support/samples'
import { cropMm, inkBox, longestDarkRunMm, pdfPages, pdfText, redPixels, renderPages, zbar } from '../support/pdf'

let c: Awaited<ReturnType<typeof everyone>>
let seeded: { id: string; code: string }[]
beforeAll(async () => {
  c = await everyone()
  seeded = (await c.technician.get('/api/samples?pageSize=100&sort=code')).body.items.map((i: any) => ({ id: i.id, code: i.code }))
})
afterAll(closeTestDb)

const MM = 72 / 25.4
const base = () => process.env.IONFOLIO_TEST_BASE_URL!

// The sheet as server/pdf/labels.ts lays it out: 3 × 10 labels of 50 × 25 mm, 56 mm and 27 mm
// apart, from 24 mm and 14.5 mm.
const slot = (i: number) => ({ x: 24 + (i % 3) * 56, y: 14.5 + Math.floor(i / 3) * 27, w: 50, h: 25 })

async function labels(client: Client, sampleIds: string[], layout: 'single' | 'sheet') {
  // The test server's public address is a loopback one: printing says so first (below).
  const r = await client.post('/api/labels', { sampleIds, layout, allowLoopback: true })
  expect(r.status, r.status === 200 ? '' : JSON.stringify(r.body)).toBe(200)
  expect(r.headers.get('content-type')).toBe('application/pdf')
  return r.body as Buffer
}

describe('a sheet of labels', () => {
  it('decodes back, label by label with ZBar, to the scan URL of each sample in order', async () => {
    const chosen = seeded.slice(0, 34)
    expect(chosen.length).toBe(34)
    const pdf = await labels(c.technician, chosen.map((s) => s.id), 'sheet')
    const info = await pdfPages(pdf)
    expect(info.pages).toBe(2)
    expect(info.width).toBeCloseTo(210 * MM, 1)
    expect(info.height).toBeCloseTo(297 * MM, 1)
    const pages = await renderPages(pdf, 300)
    const decoded: string[] = []
    for (let i = 0; i < chosen.length; i++) {
      const found = await zbar(cropMm(pages[Math.floor(i / 30)]!, 300, slot(i % 30)))
      expect(found, `label ${i + 1} (${chosen[i]!.code})`).toHaveLength(1)
      decoded.push(found[0]!)
    }
    expect(decoded).toEqual(chosen.map((s) => `${base()}/scan/${s.code}`))
    const text = await pdfText(pdf)
    for (const s of chosen) expect(text).toContain(s.code)
  })

  it('keeps all ink inside the printable area: ≥ 6.35 mm (¼ inch) from every edge (common practice, no source)', async () => {
    const pdf = await labels(c.technician, seeded.slice(0, 30).map((s) => s.id), 'sheet')
    const [page] = await renderPages(pdf, 100)
    const box = inkBox(page!, 100)
    for (const side of ['left', 'top', 'right', 'bottom'] as const) expect(box[side], side).toBeGreaterThanOrEqual(6.35)
  })

  it('prints the name, every component, the place, the pictograms as red diamonds and the radiation caution', async () => {
    // The demo stock's depleted-uranium target (H300+H330 H373 H411): found by name, since
    // other tests add uranium-bearing samples of their own.
    const uranium = (await c.technician.get(`/api/samples?q=${encodeURIComponent('Depleted uranium fluoride')}&pageSize=1`)).body.items[0]
    const full = (await c.technician.get(`/api/samples/${uranium.id}`)).body
    const pdf = await labels(c.technician, [uranium.id], 'sheet')
    const text = (await pdfText(pdf)).replace(/\s+/g, ' ')
    expect(text).toContain(uranium.code)
    expect(text).toContain('RADIOACTIVE')
    expect(text).toContain('U-238')
    // both components (uranium and fluorine), and where it is kept
    expect(text).toMatch(/238\s*U 99\.8 % \+ F/)
    expect(text).toContain(full.location.path.split(' › ').at(-1))
    // no pictogram codes as text any more: the diamonds are drawn, with their red frames
    expect(text).not.toMatch(/GHS0\d/)
    const [page] = await renderPages(pdf, 200)
    expect(redPixels(page!, 200, slot(0))).toBeGreaterThan(300)
    expect(redPixels(page!, 200, slot(1))).toBe(0)
  })

  it('carries a 50 mm scale bar that renders 50 mm long at 100 %', async () => {
    const [page] = await renderPages(await labels(c.technician, [seeded[0]!.id], 'sheet'), 300)
    // The bar lies 8.5–10.5 mm from the top (server/pdf/labels.ts); its ticks are 0.5 pt wide.
    expect(longestDarkRunMm(page!, 300, 9, 10)).toBeCloseTo(50, 0)
  })

  it('warns before printing QR codes that point at a loopback address, and notes it when printed anyway', async () => {
    const r = await c.manager.post('/api/labels', { sampleIds: [seeded[0]!.id], layout: 'single' })
    expect(r.status).toBe(409)
    expect(r.body.data).toEqual({ reason: 'loopback-address', baseUrl: base() })
    expect(r.body.message).toMatch(/loopback/)
    await labels(c.manager, [seeded[0]!.id], 'single')
    const [row] = await testDb()('audit_log').where({ action: 'sample.label-printed', entity_id: seeded[0]!.id }).orderBy('id', 'desc').limit(1)
    expect(row!.after.loopbackAddress).toBe(base())
  })

  it('audits the printing: which samples, the layout and the print run', async () => {
    const ids = seeded.slice(0, 3).map((s) => s.id)
    await labels(c.manager, [...ids, ids[0]!], 'sheet')
    const rows = await testDb()('audit_log').where({ action: 'sample.label-printed' }).whereIn('entity_id', ids).orderBy('id', 'desc').limit(3)
    expect(rows.map((r) => r.entity_id).sort()).toEqual([...ids].sort())
    const batch = rows[0]!.after.batch
    expect(rows.every((r) => r.after.batch === batch && r.after.layout === 'sheet' && r.after.labelsInBatch === 4)).toBe(true)
    expect(rows.find((r) => r.entity_id === ids[0])!.after.copies).toBe(2)
  })
})

describe('single labels', () => {
  it('puts each label on its own 50 × 25 mm page, one QR code each', async () => {
    const chosen = seeded.slice(3, 6)
    const pdf = await labels(c.technician, chosen.map((s) => s.id), 'single')
    const info = await pdfPages(pdf)
    expect(info.pages).toBe(3)
    expect(info.width).toBeCloseTo(50 * MM, 2)
    expect(info.height).toBeCloseTo(25 * MM, 2)
    const pages = await renderPages(pdf, 300)
    const decoded = await Promise.all(pages.map(zbar))
    expect(decoded).toEqual(chosen.map((s) => [`${base()}/scan/${s.code}`]))
  })

  it('prints an accented name without empty boxes', async () => {
    const s = await createSample(c.manager, { name: 'Łódź Żółć gęślą foil' })
    const text = await pdfText(await labels(c.technician, [s.id], 'single'))
    expect(text).toContain('Łódź Żółć gęślą foil')
  })
})

describe('what labels are refused', () => {
  it('refuses retired samples with their codes, and unknown ids', async () => {
    const s = await createSample(c.manager)
    await c.manager.delete(`/api/samples/${s.id}?version=1`)
    const retired = await c.technician.post('/api/labels', { sampleIds: [seeded[0]!.id, s.id], layout: 'sheet' })
    expect(retired.status).toBe(409)
    expect(retired.body.data.retired).toEqual([s.code])
    expect((await c.technician.post('/api/labels', { sampleIds: [crypto.randomUUID()], layout: 'single' })).status).toBe(404)
  })

  it('checks the list: at least one, at most 300, ids only', async () => {
    expect((await c.technician.post('/api/labels', { sampleIds: [], layout: 'sheet' })).status).toBe(400)
    expect((await c.technician.post('/api/labels', { sampleIds: Array(301).fill(seeded[0]!.id), layout: 'sheet' })).status).toBe(400)
    expect((await c.technician.post('/api/labels', { sampleIds: ['S-2026-000001'], layout: 'sheet' })).status).toBe(400)
    expect((await c.technician.post('/api/labels', { sampleIds: [seeded[0]!.id], layout: 'poster' })).status).toBe(400)
  })
})

// Last in the file: decoding a whole sheet keeps this process busy for a while, and the server
// closes idle keep-alive connections meanwhile.
describe('a photo of a whole sheet', () => {
  it('finds every code of a whole sheet in one picture with the decoder of the scan page (jsQR, tiled)', async () => {
    const chosen = seeded.slice(0, 30)
    const [page] = await renderPages(await labels(c.technician, chosen.map((s) => s.id), 'sheet'), 150)
    const png = PNG.sync.read(readFileSync(page!))
    const found = decodeAll({ data: new Uint8ClampedArray(png.data.buffer, png.data.byteOffset, png.data.length), width: png.width, height: png.height })
    expect([...found].sort()).toEqual(chosen.map((s) => `${base()}/scan/${s.code}`).sort())
  }, 120_000)

  // A sheet whose codes point at port 39029 once left S-2026-000011 unread: jsQR missed it in
  // every tile of the fine grid. The same sheet, built here as the server builds it, must give all 30.
  it('finds every code of the sheet that once lost one (codes for http://127.0.0.1:39029)', async () => {
    await preparePackageFonts()
    const content = Array.from({ length: 30 }, (_, i) =>
      labelContent({ code: `S-2026-${String(i + 1).padStart(6, '0')}`, name: `Demo foil ${i + 1}`, formula: null, form: 'foil', radioactive: false, nuclide: null, hazardStatements: [], place: null, components: [] }, 'http://127.0.0.1:39029'),
    )
    const [page] = await renderPages(await renderPdf(labelsDocument(content, 'sheet', 'Larchmere Ion Beam Laboratory')), 150)
    const png = PNG.sync.read(readFileSync(page!))
    const found = decodeAll({ data: new Uint8ClampedArray(png.data.buffer, png.data.byteOffset, png.data.length), width: png.width, height: png.height })
    expect([...found].sort()).toEqual(content.map((_, i) => `http://127.0.0.1:39029/scan/S-2026-${String(i + 1).padStart(6, '0')}`).sort())
  }, 120_000)
})
