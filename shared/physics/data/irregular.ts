/**
 * Ground configurations and terms that the filling rules do not give, with where each comes from.
 *
 * No package holds ground configurations of ions. The ion entries below are the ground shells
 * (and, in the comments, ground levels) of NIST ASD 5.12's "Ground States and Ionization Energies"
 * table, read in its export (data/nist-asd-detail.ts carries the ground shells of every ion; the
 * test tests/unit/physics/reference-detail.test.ts checks each entry here against it).
 */

export interface ConfigurationEntry {
  z: number
  charge: number
  configuration: string
  source: string
}

const NIST_VIA_PYMATGEN = "NIST ASD via pymatgen periodic_table.json 'Electronic structure'"
const NIST_ASD_GROUND_SHELLS = 'NIST ASD 5.12 ground shells (ground states and ionization energies)'

/**
 * Neutral atoms whose NIST ASD ground configuration is not the Madelung one: every such Z in
 * pymatgen's periodic_table.json (Z ≤ 103; Lr is marked tentative there). Z ≥ 104 have no entry
 * there and are left to Madelung.
 */
export const IRREGULAR_NEUTRALS: readonly ConfigurationEntry[] = [
  [24, '[Ar] 3d5 4s1'],
  [29, '[Ar] 3d10 4s1'],
  [41, '[Kr] 4d4 5s1'],
  [42, '[Kr] 4d5 5s1'],
  [44, '[Kr] 4d7 5s1'],
  [45, '[Kr] 4d8 5s1'],
  [46, '[Kr] 4d10'],
  [47, '[Kr] 4d10 5s1'],
  [57, '[Xe] 5d1 6s2'],
  [58, '[Xe] 4f1 5d1 6s2'],
  [64, '[Xe] 4f7 5d1 6s2'],
  [78, '[Xe] 4f14 5d9 6s1'],
  [79, '[Xe] 4f14 5d10 6s1'],
  [89, '[Rn] 6d1 7s2'],
  [90, '[Rn] 6d2 7s2'],
  [91, '[Rn] 5f2 6d1 7s2'],
  [92, '[Rn] 5f3 6d1 7s2'],
  [93, '[Rn] 5f4 6d1 7s2'],
  [96, '[Rn] 5f7 6d1 7s2'],
  [103, '[Rn] 5f14 7s2 7p1'],
].map(([z, configuration]) => ({ z: z as number, charge: 0, configuration: configuration as string, source: NIST_VIA_PYMATGEN }))

/**
 * Ions whose NIST ASD ground shells depart from the removal rule of configuration.ts (valence
 * electrons leave highest n first, within n highest l) or from the engine's energy search, where
 * ASD's ionisation energy of the ion is measured or semi-empirical, i.e. where the ground level
 * rests on spectra. Where ASD's value is theoretical the engine keeps its own choice and the
 * species record sets ASD's ground shells beside it (referenceConfiguration). Taking ASD's
 * calculated ground shells too was tried and not kept: for Es⁸⁺–Lr¹²⁺ ([Rn] 5f^n, values stated
 * to 1.2–1.6 %) it brought the ΔSCF from 5–11 % low to within 4 %, but the next ion, whose ASD
 * shells change type ([Hg] 5f^k 6p^m), then came out 22–36 % low: the local-density total
 * energies misplace 5f against 6p by tens of eV, so a ΔSCF across a change of configuration
 * type inherits that error, while the engine's own choices keep it spread evenly.
 */
export const IRREGULAR_IONS: readonly ConfigurationEntry[] = [
  [23, 1, '[Ar] 3d4'], // V II 5D0
  [27, 1, '[Ar] 3d8'], // Co II 3F4
  [28, 1, '[Ar] 3d9'], // Ni II 2D5/2
  [39, 1, '[Kr] 5s2'], // Y II 1S0
  [57, 1, '[Xe] 5d2'], // La II 3F2
  [58, 1, '[Xe] 4f1 5d2'], // Ce II 4H°7/2
  [58, 2, '[Xe] 4f2'], // Ce III 3H4
  [71, 1, '[Xe] 4f14 6s2'], // Lu II 1S0
  [71, 2, '[Xe] 4f14 6s1'], // Lu III 2S1/2
  [72, 1, '[Xe] 4f14 5d1 6s2'], // Hf II 2D3/2
  [89, 1, '[Rn] 7s2'], // Ac II 1S0
  [89, 2, '[Rn] 7s1'], // Ac III 2S1/2
  [90, 2, '[Rn] 5f1 6d1'], // Th III 3H°4
  [90, 3, '[Rn] 5f1'], // Th IV 2F°5/2
  [91, 1, '[Rn] 5f2 7s2'], // Pa II 3H4
  [92, 1, '[Rn] 5f3 7s2'], // U II 4I°9/2
  [92, 2, '[Rn] 5f4'], // U III 5I4
  [96, 1, '[Rn] 5f7 7s2'], // Cm II 8S°7/2
  // added from the ASD export (engine 1.3.0): ASD's value measured or semi-empirical, rule or search differs
  [74, 7, '[Kr] 4d10 4f13 5s2 5p6'], // W VIII 2F°7/2 (the search gave 4f14 5p5)
  [74, 11, '[Kr] 4d10 4f13 5s2 5p2'], // W XII 4F°7/2 (the search gave 4f14 5p1)
  [74, 16, '[Kr] 4d10 4f11 5s1'], // W XVII 5I°8 (the search gave 4f10 5s2)
  [90, 1, '[Rn] 6d1 7s2'], // Th II 2D3/2
  [93, 2, '[Rn] 5f5'], // Np III 6H°5/2
  [96, 2, '[Rn] 5f8'], // Cm III 7F6
].map(([z, charge, configuration]) => ({
  z: z as number,
  charge: charge as number,
  configuration: configuration as string,
  source: NIST_ASD_GROUND_SHELLS,
}))

/**
 * Anions whose ground configuration is not the neutral's plus one electron in Madelung order:
 * the alkaline-earth anions bind an np electron (Ca⁻ 4s2 4p), as do Sc⁻ and Y⁻; La⁻, Ce⁻ and Th⁻
 * add a d electron. All from memory of the photodetachment literature. Other lanthanide and
 * actinide anions are uncertain; the engine keeps the Madelung result there, and every anion
 * record carries a caution saying its configuration is less certain than an ion's.
 */
export const IRREGULAR_ANIONS: readonly ConfigurationEntry[] = [
  [20, '[Ar] 4s2 4p1'],
  [21, '[Ar] 3d1 4s2 4p1'],
  [38, '[Kr] 5s2 5p1'],
  [39, '[Kr] 4d1 5s2 5p1'],
  [56, '[Xe] 6s2 6p1'],
  [57, '[Xe] 5d2 6s2'],
  [58, '[Xe] 4f1 5d2 6s2'],
  [88, '[Rn] 7s2 7p1'],
  [90, '[Rn] 6d3 7s2'],
].map(([z, configuration]) => ({
  z: z as number,
  charge: -1,
  configuration: configuration as string,
  source: 'photodetachment studies (from memory)',
}))

export interface TermEntry {
  z: number
  charge: number
  term: string
  source: string
}

/**
 * Ground levels that are not the Hund's-rules term of the ground configuration. The neutral
 * entries are every such case in pymatgen's 'Ground level' (see tests/unit/physics/terms.test.ts);
 * Pb I is listed by NIST in jj coupling, (1/2,1/2)0, whose J agrees with Hund's 3P0, so it is not here.
 */
export const NON_HUND_TERMS: readonly TermEntry[] = [
  { z: 58, charge: 0, term: '1G°4', source: "NIST ASD via pymatgen periodic_table.json 'Ground level'" },
  { z: 58, charge: 1, term: '4H°7/2', source: 'NIST ASD 5.12 ground level (ground states and ionization energies)' },
  { z: 21, charge: -1, term: '1D°2', source: 'photodetachment studies (from memory)' },
  { z: 39, charge: -1, term: '1D°2', source: 'photodetachment studies (from memory)' },
]
