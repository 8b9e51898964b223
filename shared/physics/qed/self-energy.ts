/**
 * One-loop self-energy of the 1s level of a one-electron ion:
 *   ΔE_SE = (α/π) (Zα)⁴ F(Zα) m c²   (n = 1).
 *
 * F(Zα) for Z = 10 … 120 from the tabulation in V. M. Shabaev, I. I. Tupitsyn and V. A. Yerokhin,
 * Phys. Rev. A 88, 012513 (2013) (all-order values after P. J. Mohr; extended nucleus where they
 * give it), as carried by the open Jena Atomic Calculator (JAC, S. Fritzsche), module
 * InteractionStrengthQED. Below Z = 10 and between the table's points the literature
 * interpolates the smooth remainder G(Zα) of the low-Z expansion rather than F itself
 * (P. J. Mohr, Phys. Rev. A 46, 4421 (1992); Mohr, Taylor and Newell, CODATA 2006, Rev. Mod. Phys.
 * 80, 633 (2008), eq. for F):
 *   F = A41 L + A40 + A50 (Zα) + (Zα)² [A62 L² + A61 L + G(Zα)],  L = ln (Zα)⁻²,
 * with A41 = 4/3, A40 = 10/9 − (4/3) ln k0, ln k0(1s) = 2.984 128 556, A50 = 4π (139/128 − ln2 / 2),
 * A62 = −1, A61 = 28/3 ln 2 − 21/20 and G(0) = A60 = −30.924 15 (coefficients from memory;
 * they reproduce F(1) = 10.3168, the hydrogen value of the same papers, to 1e−4).
 */

const F_TABLE: readonly (readonly [number, number])[] = [
  [10, 4.6542], [20, 3.2462], [30, 2.5518], [40, 2.1347], [50, 1.8633], [60, 1.682],
  [70, 1.5637], [80, 1.4955], [90, 1.4721], [100, 1.4961], [110, 1.5771], [120, 1.7335],
]
export const SELF_ENERGY_SOURCE =
  'F(Zα) of V. M. Shabaev, I. I. Tupitsyn and V. A. Yerokhin, Phys. Rev. A 88, 012513 (2013), with the low-Z expansion of P. J. Mohr, Phys. Rev. A 46, 4421 (1992)'

const ALPHA = 7.2973525693e-3
const LN_K0 = 2.984128556
const A41 = 4 / 3
const A40 = 10 / 9 - (4 / 3) * LN_K0
const A50 = 4 * Math.PI * (139 / 128 - Math.LN2 / 2)
const A62 = -1
const A61 = (28 / 3) * Math.LN2 - 21 / 20
const A60 = -30.92415

/** The low-Z expansion of F without its remainder G. */
function expansion(x: number): number {
  const l = Math.log(1 / (x * x))
  return A41 * l + A40 + A50 * x + x * x * (A62 * l * l + A61 * l)
}

// G at Z = 0 (A60) and at each tabulated Z, interpolated linearly in Z between them.
const G_NODES: readonly (readonly [number, number])[] = [
  [0, A60],
  ...F_TABLE.map(([z, f]) => [z, (f - expansion(z * ALPHA)) / (z * ALPHA) ** 2] as const),
]

/** F(Zα) for the 1s level, 1 ≤ Z ≤ 120. */
export function selfEnergyF1s(z: number): number {
  if (!(z >= 1 && z <= 120)) throw new RangeError('self-energy table covers Z = 1–120')
  let i = 0
  while (i < G_NODES.length - 2 && G_NODES[i + 1][0] < z) i++
  const [z0, g0] = G_NODES[i]
  const [z1, g1] = G_NODES[i + 1]
  const g = g0 + ((z - z0) / (z1 - z0)) * (g1 - g0)
  const x = z * ALPHA
  return expansion(x) + x * x * g
}

/** ΔE_SE of the 1s level in units of m c² (positive: the level rises). */
export function selfEnergyShift1s(z: number): number {
  const x = z * ALPHA
  return (ALPHA / Math.PI) * x ** 4 * selfEnergyF1s(z)
}
