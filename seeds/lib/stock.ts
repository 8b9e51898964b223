// The demo stock of the fictional Larchmere Ion Beam Laboratory. Rooms, suppliers, lots and
// people are invented; the physical figures (densities, enrichments) are typical of the trade.

export const PLACES = [
  { code: 'B1-012', kind: 'room', name: 'Target preparation laboratory' },
  { code: 'B1-012-GB', kind: 'cabinet', name: 'Argon glovebox store', parent: 'B1-012' },
  { code: 'B1-012-GB-1', kind: 'shelf', name: 'Glovebox shelf 1', parent: 'B1-012-GB' },
  { code: 'B1-012-GB-2', kind: 'shelf', name: 'Glovebox shelf 2', parent: 'B1-012-GB' },
  { code: 'B1-012-D1', kind: 'cabinet', name: 'Desiccator cabinet', parent: 'B1-012' },
  { code: 'B1-012-D1-A', kind: 'shelf', name: 'Desiccator, upper shelf', parent: 'B1-012-D1' },
  { code: 'B1-012-D1-B', kind: 'shelf', name: 'Desiccator, lower shelf', parent: 'B1-012-D1' },
  { code: 'B1-020', kind: 'room', name: 'Gas store' },
  { code: 'B1-020-R1', kind: 'cabinet', name: 'Cylinder rack', parent: 'B1-020' },
  { code: 'B1-020-R1-1', kind: 'shelf', name: 'Rack bay 1', parent: 'B1-020-R1' },
  { code: 'B2-114', kind: 'room', name: 'Accelerator hall, terminal store' },
  { code: 'B2-114-C1', kind: 'cabinet', name: 'Stripper foil cabinet', parent: 'B2-114' },
  { code: 'B2-114-C1-1', kind: 'shelf', name: 'Foil drawer 1', parent: 'B2-114-C1' },
  { code: 'B2-114-C1-2', kind: 'shelf', name: 'Foil drawer 2', parent: 'B2-114-C1' },
  { code: 'B2-130', kind: 'room', name: 'Controlled materials store' },
  { code: 'B2-130-S1', kind: 'cabinet', name: 'Locked safe', parent: 'B2-130' },
  { code: 'B2-130-S1-1', kind: 'shelf', name: 'Safe, top shelf', parent: 'B2-130-S1' },
  { code: 'B3-201', kind: 'room', name: 'Ion source workshop' },
  { code: 'B3-201-K1', kind: 'cabinet', name: 'Cathode cabinet', parent: 'B3-201' },
  { code: 'B3-201-K1-1', kind: 'shelf', name: 'Cathode tray 1', parent: 'B3-201-K1' },
  { code: 'B3-201-K1-2', kind: 'shelf', name: 'Cathode tray 2', parent: 'B3-201-K1' },
] as const

const S = {
  quill: 'Quillmoor Isotopes',
  veltane: 'Veltane Thin Films',
  bracken: 'Brackenfold Metals',
  siskin: 'Siskin Gas Supply',
  alder: 'Aldermere Enrichment',
  tolvane: 'Tolvane Carbon',
}

export interface SeedDoc {
  name: string
  kind: 'coa' | 'isotopic' | 'note'
}

export interface SeedSample {
  name: string
  material: string
  formula?: string
  form: string
  status?: string
  arealDensity?: number
  arealDensityUncertainty?: number
  thickness?: number
  bulkDensity?: number
  massMg?: number
  backing?: string
  supplier?: string
  lot?: string
  /** days before the seed runs */
  receivedDaysAgo?: number
  /** days after the seed runs (negative: overdue) */
  recertifyInDays?: number
  place?: string
  hazards?: string
  radioactive?: boolean
  nuclide?: string
  activityBq?: number
  notes?: string
  /** "Ca-48 1 enr 97.8±0.2%; C 0.2" — the CSV notation */
  composition: string
  basis?: 'atom' | 'mass'
  docs?: SeedDoc[]
}

const coa = (name: string): SeedDoc => ({ name, kind: 'coa' })
const iso = (name: string): SeedDoc => ({ name, kind: 'isotopic' })

export const SAMPLES: SeedSample[] = [
  // enriched-isotope targets
  { name: '48Ca metal target, 1 mg/cm²', material: 'Calcium metal, enriched in 48Ca', formula: 'Ca', form: 'foil', arealDensity: 1000, arealDensityUncertainty: 30, bulkDensity: 1.55, massMg: 3.1, supplier: S.alder, lot: 'AE-24-0317', receivedDaysAgo: 210, recertifyInDays: 155, place: 'B1-012-GB-1', hazards: 'H261', composition: 'Ca-48 1 enr 97.8±0.2%', docs: [coa('AE-24-0317 certificate of analysis.pdf'), iso('AE-24-0317 isotopic analysis.csv')] },
  { name: '48CaCO3 powder', material: 'Calcium carbonate, enriched in 48Ca', formula: 'CaCO3', form: 'powder', massMg: 25.4, supplier: S.alder, lot: 'AE-24-0318', receivedDaysAgo: 210, recertifyInDays: 520, place: 'B1-012-D1-A', composition: 'Ca-48 0.2 enr 95.2±0.3%; C 0.2; O 0.6', docs: [coa('AE-24-0318 certificate.pdf')] },
  { name: '58Ni self-supporting foil', material: 'Nickel metal, enriched in 58Ni', formula: 'Ni', form: 'foil', arealDensity: 500, arealDensityUncertainty: 15, bulkDensity: 8.908, massMg: 1.8, supplier: S.quill, lot: 'QI-58N-1102', receivedDaysAgo: 400, recertifyInDays: 20, place: 'B1-012-D1-A', hazards: 'H317 H351 H372', composition: 'Ni-58 1 iso[58=99.61±0.05 60=0.33±0.04 61=0.01±0.005 62=0.04±0.01 64=0.01±0.005]%', docs: [coa('QI-58N-1102 CoA.pdf'), iso('QI-58N-1102 isotopes.csv')] },
  { name: '64Ni foil on carbon', material: 'Nickel metal, enriched in 64Ni', formula: 'Ni', form: 'foil', arealDensity: 300, arealDensityUncertainty: 12, bulkDensity: 8.908, backing: 'C, 20 µg/cm²', supplier: S.quill, lot: 'QI-64N-0877', receivedDaysAgo: 95, recertifyInDays: 270, place: 'B1-012-D1-A', hazards: 'H317 H351 H372', composition: 'Ni-64 1 enr 98.02±0.1%' },
  { name: '208Pb target, 400 µg/cm²', material: 'Lead metal, enriched in 208Pb', formula: 'Pb', form: 'foil', arealDensity: 400, arealDensityUncertainty: 20, bulkDensity: 11.34, backing: 'C, 15 µg/cm²', supplier: S.alder, lot: 'AE-23-1190', receivedDaysAgo: 700, recertifyInDays: -12, place: 'B1-012-D1-B', hazards: 'H360FD H372 H410', composition: 'Pb-208 1 enr 98.7±0.2%', docs: [coa('AE-23-1190 certificate.pdf')] },
  { name: '13C enriched foil', material: 'Carbon, enriched in 13C', formula: 'C', form: 'foil', arealDensity: 100, arealDensityUncertainty: 5, bulkDensity: 2.0, supplier: S.tolvane, lot: 'TC-13-0044', receivedDaysAgo: 60, recertifyInDays: 700, place: 'B2-114-C1-2', composition: 'C-13 1 enr 99.1%' },
  { name: '50Ti target', material: 'Titanium metal, enriched in 50Ti', formula: 'Ti', form: 'foil', arealDensity: 800, arealDensityUncertainty: 25, bulkDensity: 4.506, supplier: S.quill, lot: 'QI-50T-0213', receivedDaysAgo: 150, recertifyInDays: 215, place: 'B1-012-D1-A', composition: 'Ti-50 1 enr 90.4±0.4%', docs: [iso('QI-50T-0213 isotopes.csv')] },
  { name: '7LiF on carbon backing', material: 'Lithium fluoride, enriched in 7Li', formula: 'LiF', form: 'foil', arealDensity: 150, arealDensityUncertainty: 8, bulkDensity: 2.635, backing: 'C, 10 µg/cm²', supplier: S.veltane, lot: 'VT-0921-L7', receivedDaysAgo: 330, recertifyInDays: 35, place: 'B1-012-D1-B', hazards: 'H301 H315 H319', composition: 'Li-7 0.5 enr 99.9%; F 0.5' },
  { name: '116Sn rolled foil', material: 'Tin metal, enriched in 116Sn', formula: 'Sn', form: 'foil', arealDensity: 1200, arealDensityUncertainty: 40, bulkDensity: 7.287, supplier: S.alder, lot: 'AE-24-0102', receivedDaysAgo: 260, recertifyInDays: 105, place: 'B1-012-D1-B', composition: 'Sn-116 1 enr 97.5%' },
  { name: '96Zr foil', material: 'Zirconium metal, enriched in 96Zr', formula: 'Zr', form: 'foil', status: 'in_use', arealDensity: 600, arealDensityUncertainty: 20, bulkDensity: 6.52, supplier: S.quill, lot: 'QI-96Z-0460', receivedDaysAgo: 180, recertifyInDays: 185, place: 'B2-114-C1-2', composition: 'Zr-96 1 enr 86.3±0.5%' },
  { name: '154Sm2O3 powder', material: 'Samarium oxide, enriched in 154Sm', formula: 'Sm2O3', form: 'powder', massMg: 48, supplier: S.alder, lot: 'AE-22-0731', receivedDaysAgo: 900, recertifyInDays: -40, place: 'B1-012-D1-B', composition: 'Sm-154 0.4 enr 98.7%; O 0.6', docs: [coa('AE-22-0731 certificate.pdf')] },
  // metal foils of natural composition
  { name: 'Gold foil, 100 nm', material: 'Gold, 99.99 %', formula: 'Au', form: 'foil', thickness: 100, bulkDensity: 19.32, supplier: S.bracken, lot: 'BM-AU-5531', receivedDaysAgo: 45, recertifyInDays: 320, place: 'B2-114-C1-1', composition: 'Au 1' },
  { name: 'Gold foil, 1 mg/cm²', material: 'Gold, 99.99 %', formula: 'Au', form: 'foil', arealDensity: 1000, arealDensityUncertainty: 20, bulkDensity: 19.32, supplier: S.bracken, lot: 'BM-AU-5532', receivedDaysAgo: 45, recertifyInDays: 320, place: 'B2-114-C1-1', composition: 'Au 1', docs: [coa('BM-AU-5532 CoA.pdf')] },
  { name: 'Tantalum foil, 2 mg/cm²', material: 'Tantalum, 99.95 %', formula: 'Ta', form: 'foil', arealDensity: 2000, arealDensityUncertainty: 60, bulkDensity: 16.69, supplier: S.bracken, lot: 'BM-TA-2207', receivedDaysAgo: 500, recertifyInDays: 60, place: 'B2-114-C1-1', composition: 'Ta 1' },
  { name: 'Aluminium degrader foil, 6 µm', material: 'Aluminium, 99.5 %', formula: 'Al', form: 'foil', thickness: 6000, bulkDensity: 2.70, supplier: S.bracken, lot: 'BM-AL-0099', receivedDaysAgo: 800, place: 'B2-114-C1-1', composition: 'Al 1' },
  { name: 'Iron foil, natural, 2 mg/cm²', material: 'Iron, 99.99 %', formula: 'Fe', form: 'foil', arealDensity: 2000, arealDensityUncertainty: 50, bulkDensity: 7.874, supplier: S.bracken, lot: 'BM-FE-0640', receivedDaysAgo: 75, recertifyInDays: 400, place: 'B2-114-C1-1', composition: 'Fe 1' },
  { name: '57Fe foil on carbon', material: 'Iron metal, enriched in 57Fe', formula: 'Fe', form: 'foil', arealDensity: 250, arealDensityUncertainty: 10, bulkDensity: 7.874, backing: 'C, 20 µg/cm²', supplier: S.quill, lot: 'QI-57F-0318', receivedDaysAgo: 130, recertifyInDays: 240, place: 'B1-012-D1-A', composition: 'Fe-57 1 enr 95.9±0.2%', docs: [iso('QI-57F-0318 isotopes.csv')] },
  { name: 'Nickel foil, natural', material: 'Nickel, 99.9 %', formula: 'Ni', form: 'foil', arealDensity: 900, bulkDensity: 8.908, supplier: S.bracken, lot: 'BM-NI-3318', receivedDaysAgo: 120, recertifyInDays: 600, place: 'B1-012-D1-A', hazards: 'H317 H351 H372', composition: 'Ni 1' },
  { name: 'Titanium foil, 5 µm', material: 'Titanium, 99.6 %', formula: 'Ti', form: 'foil', thickness: 5000, bulkDensity: 4.506, supplier: S.bracken, lot: 'BM-TI-7710', receivedDaysAgo: 300, place: 'B2-114-C1-1', composition: 'Ti 1' },
  { name: 'Copper foil, 10 µm', material: 'Copper, OFHC', formula: 'Cu', form: 'foil', status: 'depleted', thickness: 10000, bulkDensity: 8.96, supplier: S.bracken, lot: 'BM-CU-1200', receivedDaysAgo: 1100, place: 'B2-114-C1-1', composition: 'Cu 1' },
  { name: 'Beryllium window foil, 25 µm', material: 'Beryllium, 99.8 %', formula: 'Be', form: 'foil', thickness: 25000, bulkDensity: 1.85, supplier: S.bracken, lot: 'BM-BE-0412', receivedDaysAgo: 640, recertifyInDays: 10, place: 'B2-130-S1-1', hazards: 'H301 H315 H317 H319 H330 H335 H350i H372', composition: 'Be 1', notes: 'Handle only in the fume cupboard of B1-012; never cut or abrade.', docs: [coa('BM-BE-0412 certificate.pdf')] },
  { name: 'Cadmium foil, 1 mg/cm²', material: 'Cadmium, 99.99 %', formula: 'Cd', form: 'foil', arealDensity: 1000, bulkDensity: 8.65, supplier: S.bracken, lot: 'BM-CD-0088', receivedDaysAgo: 450, recertifyInDays: 75, place: 'B2-130-S1-1', hazards: 'H330 H341 H350 H361fd H372 H410', composition: 'Cd 1' },
  // carbon stripper foils
  ...[3, 5, 10, 20].map((ug, i): SeedSample => ({
    name: `Carbon stripper foil, ${ug} µg/cm² (box of 10)`,
    material: 'Amorphous carbon, arc-evaporated',
    formula: 'C',
    form: 'stripper_foil',
    status: i === 1 ? 'in_use' : 'available',
    arealDensity: ug,
    arealDensityUncertainty: Math.max(0.3, ug * 0.1),
    bulkDensity: 2.0,
    supplier: S.tolvane,
    lot: `TC-SF-${2400 + ug}`,
    receivedDaysAgo: 30 + i * 40,
    recertifyInDays: 365 - i * 90,
    place: i < 2 ? 'B2-114-C1-1' : 'B2-114-C1-2',
    composition: 'C 1',
    notes: 'Floated on glass-slide frames, 12 mm aperture.',
    docs: i === 2 ? [coa(`TC-SF-${2400 + ug} batch sheet.pdf`)] : [],
  })),
  // sputter cathodes for the negative-ion source
  { name: 'Copper cathode', material: 'Copper powder, pressed', formula: 'Cu', form: 'sputter_cathode', massMg: 150, supplier: S.bracken, lot: 'BM-CUP-0501', receivedDaysAgo: 90, place: 'B3-201-K1-1', composition: 'Cu 1' },
  { name: 'Titanium hydride cathode', material: 'Titanium hydride, pressed', formula: 'TiH2', form: 'sputter_cathode', massMg: 120, supplier: S.veltane, lot: 'VT-TIH-0310', receivedDaysAgo: 140, place: 'B3-201-K1-1', hazards: 'H228', composition: 'Ti 0.3333; H 0.6667' },
  { name: 'Graphite cathode', material: 'Graphite, spectroscopic grade', formula: 'C', form: 'sputter_cathode', status: 'in_use', massMg: 95, supplier: S.tolvane, lot: 'TC-GR-1180', receivedDaysAgo: 20, place: 'B3-201-K1-1', composition: 'C 1' },
  { name: 'Aluminium oxide cathode', material: 'Alumina powder mixed with silver', formula: 'Al2O3', form: 'sputter_cathode', massMg: 130, supplier: S.veltane, lot: 'VT-ALO-0777', receivedDaysAgo: 240, place: 'B3-201-K1-2', composition: 'Al 0.4; O 0.6' },
  { name: '58Ni cathode', material: 'Nickel powder, enriched in 58Ni, pressed', formula: 'Ni', form: 'sputter_cathode', status: 'quarantined', massMg: 80, supplier: S.quill, lot: 'QI-58N-1140', receivedDaysAgo: 5, recertifyInDays: 360, place: 'B3-201-K1-2', hazards: 'H317 H351 H372', composition: 'Ni-58 1 enr 99.5%', notes: 'Waiting for the isotopic analysis before first use.' },
  // gas cylinders
  { name: 'Argon 5.0, 10 L cylinder', material: 'Argon, 99.999 %', formula: 'Ar', form: 'gas_cylinder', supplier: S.siskin, lot: 'SG-AR-66120', receivedDaysAgo: 70, recertifyInDays: 900, place: 'B1-020-R1-1', hazards: 'H280', composition: 'Ar 1' },
  { name: 'Helium 6.0, 10 L cylinder', material: 'Helium, 99.9999 %', formula: 'He', form: 'gas_cylinder', status: 'in_use', supplier: S.siskin, lot: 'SG-HE-31877', receivedDaysAgo: 200, recertifyInDays: 25, place: 'B1-020-R1-1', hazards: 'H280', composition: 'He 1', docs: [coa('SG-HE-31877 cylinder certificate.pdf')] },
  { name: 'Sulfur hexafluoride, insulating gas', material: 'SF6, 99.9 %', formula: 'SF6', form: 'gas_cylinder', supplier: S.siskin, lot: 'SG-SF-09012', receivedDaysAgo: 1000, recertifyInDays: 400, place: 'B1-020-R1-1', hazards: 'H280', composition: 'S 0.142857; F 0.857143' },
  { name: 'Hydrogen 5.0, 2 L cylinder', material: 'Hydrogen, 99.999 %', formula: 'H2', form: 'gas_cylinder', supplier: S.siskin, lot: 'SG-H2-44501', receivedDaysAgo: 60, recertifyInDays: 1000, place: 'B1-020-R1-1', hazards: 'H220 H280', composition: 'H 1' },
  // the one radioactive actinide target
  {
    name: 'Depleted uranium fluoride target',
    material: 'Uranium tetrafluoride on aluminium, depleted in 235U',
    formula: 'UF4',
    form: 'foil',
    arealDensity: 250,
    arealDensityUncertainty: 15,
    massMg: 0.9,
    backing: 'Al, 1.5 mg/cm²',
    supplier: S.alder,
    lot: 'AE-21-RAD-07',
    receivedDaysAgo: 1300,
    recertifyInDays: 45,
    place: 'B2-130-S1-1',
    hazards: 'H300+H330 H373 H411',
    radioactive: true,
    nuclide: 'U-238',
    activityBq: 8.5,
    composition: 'U-238 0.2 enr 99.8%; F 0.8',
    notes: 'Listed on the laboratory licence. Logbook entry for every removal from the safe.',
    docs: [coa('AE-21-RAD-07 certificate.pdf'), { name: 'AE-21-RAD-07 handling note.txt', kind: 'note' }],
  },
]
