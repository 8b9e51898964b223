/**
 * Where the isotope masses and natural abundances Ionfolio computes with come from. The npm
 * package chemical-elements 2.3.3 is how we carry them, not their source: its values were checked
 * against the evaluations (tests/unit/samples/isotope-sources.test.ts) before these were written.
 *
 * - Masses: the 2016 Atomic Mass Evaluation, not AME2020 — the package's ¹H is 1.007 825 032 23 u,
 *   the AME2016 value; AME2020 gives 1.007 825 031 898 u.
 * - Abundances: NIST's "Atomic Weights and Isotopic Compositions" table, whose representative
 *   compositions are those of the IUPAC 1997 report (Rosman & Taylor 1998), with a few later
 *   updates (argon); they are not the CIAAW 2013 evaluation (Meija et al. 2016): e.g. ⁸⁰Se 0.4961
 *   here against 0.4980 there, ¹⁰⁶Cd 0.0125 against 0.012 45.
 */
export const ISOTOPE_DATA_SOURCES = {
  masses:
    'Atomic masses: the Atomic Mass Evaluation AME2016, M. Wang, G. Audi, F. G. Kondev, W. J. Huang, S. Naimi, X. Xu, Chin. Phys. C 41, 030003 (2017).',
  abundances:
    'Natural isotopic compositions: NIST Standard Reference Database 144, Atomic Weights and Isotopic Compositions (J. S. Coursey et al.), representative compositions after IUPAC, K. J. R. Rosman, P. D. P. Taylor, Pure Appl. Chem. 70, 217 (1998), with later updates; natural abundances are taken as exact (their uncertainties are not carried).',
  carrier: 'Carried in Ionfolio by the npm package chemical-elements 2.3.3 (MIT licence).',
} as const

/** One line naming the evaluations, for pages and certificates. */
export const ISOTOPE_SOURCE = `AME2016 atomic masses (Wang et al., Chin. Phys. C 41, 030003 (2017)) and NIST SRD 144 isotopic compositions (after IUPAC, Rosman & Taylor, Pure Appl. Chem. 70, 217 (1998)), carried by npm chemical-elements 2.3.3`
