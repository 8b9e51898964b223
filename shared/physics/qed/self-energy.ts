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
 * with A41 = 4/3, A40 = 10/9 − (4/3) ln k0, A50 = 4π (139/128 − ln2 / 2), A62 = −1 and
 * A61 = 28/3 ln 2 − 21/20 (closed forms from memory), the Bethe logarithm ln k0(1s) = 2.984 128 556
 * (G. W. F. Drake and R. A. Swainson, Phys. Rev. A 41, 1243 (1990)) and G(0) = A60 = −30.924 15(1)
 * (U. D. Jentschura, P. J. Mohr and G. Soff, Phys. Rev. Lett. 82, 53 (1999)). The two numbers were
 * read as several independent public research codes quote them with those citations, not in the
 * papers themselves; together they reproduce F(1) = 10.3168, the hydrogen value, to 1e−4.
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

/**
 * F(Zα) of the 2s level, Z = 10 … 120 in steps of 5: the point-nucleus values plus the
 * finite-nuclear-size (Fermi distribution) corrections of V. M. Shabaev, I. I. Tupitsyn and
 * V. A. Yerokhin, Phys. Rev. A 88, 012513 (2013), as carried by their QEDMOD program (Comput.
 * Phys. Commun. 189, 175 (2015)) in the Flexible Atomic Code, file modqed/fse_dat.f
 * (FSE(Z, κ = −1, 2, 2) and FSEfns(Z, −1, 2, 2)); read there, both columns kept as printed.
 */
const F2S_TABLE: readonly (readonly [number, number, number])[] = [
  [10, 4.894415318, -0.0000325388],
  [15, 4.0508754709, -0.0000591026],
  [20, 3.5066469903, -0.0001020626],
  [25, 3.1229584751, -0.0001605573],
  [30, 2.8388374559, -0.0002436753],
  [35, 2.622335129, -0.0003647582],
  [40, 2.4548280564, -0.0005110657],
  [45, 2.324688953, -0.0007512565],
  [50, 2.2243367444, -0.0010752132],
  [55, 2.1487259469, -0.0015386464],
  [60, 2.0945167604, -0.0021832739],
  [65, 2.0596099487, -0.0031688653],
  [70, 2.0428907653, -0.004791836],
  [75, 2.0441145434, -0.0068422119],
  [80, 2.0639050024, -0.0102004289],
  [85, 2.103876653, -0.0152431342],
  [90, 2.1668847406, -0.0237389688],
  [95, 2.2575389745, -0.0378010798],
  [100, 2.3831206493, -0.0584441368],
  [105, 2.5552975921, -0.0951103852],
  [110, 2.7935929168, -0.1601463597],
  [115, 3.1330543617, -0.2811342014],
  [120, 3.6437480112, -0.5181665881],
]
export const SELF_ENERGY_2S_SOURCE =
  'F(Zα) of the 2s level of V. M. Shabaev, I. I. Tupitsyn and V. A. Yerokhin, Phys. Rev. A 88, 012513 (2013), extended nucleus (values as carried by their QEDMOD program in the Flexible Atomic Code)'

/**
 * F(Zα) of the 2s level with the nuclear-size part, 10 ≤ Z ≤ 120: four-point Lagrange
 * interpolation of F − A41·ln (Zα)⁻², which is smooth where F itself has the logarithm (the
 * interpolation QEDMOD uses for s levels).
 */
export function selfEnergyF2s(z: number): number {
  if (!(z >= 10 && z <= 120)) throw new RangeError('the 2s self-energy table covers Z = 10–120')
  const smooth = ([zi, point, size]: readonly [number, number, number]) => point + size - A41 * Math.log(1 / (zi * ALPHA) ** 2)
  let i = Math.min(F2S_TABLE.length - 3, Math.max(1, Math.floor((z - 10) / 5)))
  if (z <= F2S_TABLE[1][0]) i = 1
  const nodes = F2S_TABLE.slice(i - 1, i + 3)
  let sum = 0
  for (let a = 0; a < 4; a++) {
    let w = 1
    for (let b = 0; b < 4; b++) if (b !== a) w *= (z - nodes[b][0]) / (nodes[a][0] - nodes[b][0])
    sum += w * smooth(nodes[a])
  }
  return sum + A41 * Math.log(1 / (z * ALPHA) ** 2)
}

/** ΔE_SE of the 2s level in units of m c²: (α/π) (Zα)⁴ F / n³ with n = 2. */
export function selfEnergyShift2s(z: number): number {
  const x = z * ALPHA
  return ((ALPHA / Math.PI) * x ** 4 * selfEnergyF2s(z)) / 8
}
