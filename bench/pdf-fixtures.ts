// The documents bench/pdf.ts times, built from the fictional demo stock (seeds/lib/stock.ts) the
// way the server builds them: certificates from their frozen payloads, labels from samples.
import { createHash } from 'node:crypto'
import { SampleBody } from '../shared/schemas/samples'
import { parseComposition } from '../shared/samples/csv'
import { samplePayload, type CertSampleInput } from '../shared/certificates/sample-payload'
import { speciesPayload } from '../shared/certificates/species-payload'
import { canonicalJson } from '../shared/certificates/canonical'
import { labelContent } from '../shared/labels/content'
import { describeSpecies } from '../shared/physics/index'
import { SAMPLES } from '../seeds/lib/stock'
import { certificateDocument, type CertificatePayload } from '../server/pdf/certificate'
import { labelsDocument } from '../server/pdf/labels'

const LAB = 'Larchmere Ion Beam Laboratory'
const BASE = 'https://ionfolio.larchmere-lab.example'
const day = (offset: number) => new Date(Date.now() + offset * 86_400_000).toISOString().slice(0, 10)

const stock = SAMPLES.map((s, i) => {
  const { receivedDaysAgo, recertifyInDays, place, hazards, composition, basis, docs: _docs, ...fields } = s
  const data = SampleBody.parse({
    ...fields,
    receivedOn: receivedDaysAgo === undefined ? null : day(-receivedDaysAgo),
    recertifyBy: recertifyInDays === undefined ? null : day(Math.abs(recertifyInDays) + 30),
    hazardStatements: hazards ?? [],
    components: parseComposition(composition, basis ?? 'atom').components,
  })
  const code = `S-2026-${String(i + 1).padStart(6, '0')}`
  const input: CertSampleInput = { ...data, id: `00000000-0000-4000-8000-${String(i).padStart(12, '0')}`, code, location: place ? { path: place, name: 'Demo place' } : null }
  return input
})

function ctx(n: number) {
  return { number: `C-2026-${String(n).padStart(6, '0')}`, version: 1, labName: LAB, issuedAt: new Date().toISOString(), issuer: { name: 'Maren Okafor', role: 'Lab manager' }, replaces: null }
}

function certificate(payload: CertificatePayload) {
  const digest = createHash('sha256').update(canonicalJson(payload)).digest('hex')
  return certificateDocument(payload, digest, `${BASE}/verify/${payload.number}?digest=${digest}`, `${BASE}/verify/${payload.number}`)
}

const byName = (name: string) => stock.find((s) => s.name === name)!

/** A one-page certificate: a single-isotope foil without hazards (a new document each call: pdfmake consumes it). */
export const onePageCertificate = () => certificate(samplePayload(byName('13C enriched foil'), [{ fileName: 'TC-13-0044 CoA.pdf', sha256: 'c'.repeat(64) }], ctx(1)) as CertificatePayload)

/** A certificate of a foil with the supplier's full isotopic analysis. */
export const analysedCertificate = () => certificate(samplePayload(byName('58Ni self-supporting foil'), [{ fileName: 'QI-58N-1102 CoA.pdf', sha256: 'e'.repeat(64) }], ctx(3)) as CertificatePayload)

/** A long certificate: a radioactive, toxic compound target with supplier documents. */
export const hazardousCertificate = () => certificate(samplePayload(stock.find((s) => s.radioactive)!, [{ fileName: 'certificate.pdf', sha256: 'd'.repeat(64) }], ctx(2)) as CertificatePayload)

/** A species certificate (Fe XIV, engine methods without SCF). */
export function speciesCertificate() {
  const record = describeSpecies('Fe13+')
  const payload = speciesPayload({ id: '00000000-0000-4000-8000-00000000f00e', label: 'Fe13+', spectroscopic: 'Fe XIV', elementName: 'Iron', z: 26, charge: 13, massNumber: null, result: { id: 'bench', engine: record.engine, methods: record.ionisationEnergy.estimates.map((e) => e.method), recordedAt: new Date().toISOString(), recordedBy: 'Tobias Vellacott', record } }, ctx(3))
  return certificate(payload as CertificatePayload)
}

/** `n` labels of the demo stock, round and round, as a sheet or single labels. */
export function labels(n: number, layout: 'sheet' | 'single') {
  const content = Array.from({ length: n }, (_, i) => {
    const s = stock[i % stock.length]!
    return labelContent({ ...s, code: `S-2026-${String(i + 1).padStart(6, '0')}`, place: s.location }, BASE)
  })
  return labelsDocument(content, layout, LAB)
}

/** The least PDF there is with the same fonts: one line of text. */
export const trivial = () => ({ pageSize: 'A4', defaultStyle: { font: 'Inter', fontSize: 10 }, content: ['Ionfolio'] })
