/**
 * Local spin-density exchange–correlation, hartree units.
 *
 * Exchange: the Dirac–Slater form for each spin, e_x = −¾(6/π)^{1/3}(ρ↑^{4/3} + ρ↓^{4/3})
 * (J. C. Slater, Phys. Rev. 81, 385, 1951 with the Kohn–Sham coefficient, W. Kohn and L. J. Sham,
 * Phys. Rev. 140, A1133, 1965).
 * Correlation: the Ceperley–Alder electron gas as parametrised by S. H. Vosko, L. Wilk and M. Nusair,
 * Can. J. Phys. 58, 1200 (1980) (their fit "V", with the spin-stiffness interpolation), the same
 * parametrisation as the NIST atomic reference tables (S. Kotochigova, Z. H. Levine, E. L. Shirley,
 * M. D. Stiles and C. W. Clark, Phys. Rev. A 55, 191, 1997), which lets the LDA mode be checked
 * against them digit for digit.
 */

const CX = -0.75 * Math.cbrt(6 / Math.PI)
const VX = -Math.cbrt(6 / Math.PI)
const RS_FACTOR = Math.cbrt(3 / (4 * Math.PI))
const DENSITY_FLOOR = 1e-30
const F_DENOMINATOR = Math.pow(2, 4 / 3) - 2
const FPP0 = 4 / (9 * (Math.cbrt(2) - 1))

interface VwnSet {
  a: number
  x0: number
  b: number
  c: number
  q: number
  x0Term: number
}

function vwnSet(a: number, x0: number, b: number, c: number): VwnSet {
  const q = Math.sqrt(4 * c - b * b)
  return { a, x0, b, c, q, x0Term: (b * x0) / (x0 * x0 + b * x0 + c) }
}

// Vosko–Wilk–Nusair (1980): paramagnetic, ferromagnetic and spin-stiffness fits (A in hartree).
const PARA = vwnSet(0.0310907, -0.10498, 3.72744, 12.9352)
const FERRO = vwnSet(0.01554535, -0.325, 7.06042, 18.0578)
const STIFF = vwnSet(-1 / (6 * Math.PI * Math.PI), -0.0047584, 1.13107, 13.0045)

/** The VWN interpolation G(x), x = √rs: writes G into out[slot] and rs·dG/drs into out[slot + 1]. */
function vwnG(s: VwnSet, x: number, out: Float64Array, slot: number): void {
  const X = x * x + s.b * x + s.c
  const at = Math.atan(s.q / (2 * x + s.b))
  const dx = x - s.x0
  out[slot] =
    s.a *
    (Math.log((x * x) / X) +
      ((2 * s.b) / s.q) * at -
      s.x0Term * (Math.log((dx * dx) / X) + ((2 * (s.b + 2 * s.x0)) / s.q) * at))
  const dGdx = s.a * (2 / x - (2 * (x + s.b)) / X - s.x0Term * (2 / dx - (2 * (x + s.b + s.x0)) / X))
  out[slot + 1] = 0.5 * x * dGdx
}

/** Energy density (per volume) and spin potentials at one point; writes [e, v↑, v↓] into out. */
export function lsdPoint(up: number, down: number, out: Float64Array, tmp = new Float64Array(6)): void {
  const rho = up + down
  if (rho < DENSITY_FLOOR) {
    out[0] = 0
    out[1] = 0
    out[2] = 0
    return
  }
  const cu = up > 0 ? Math.cbrt(up) : 0
  const cd = down > 0 ? Math.cbrt(down) : 0
  const ex = CX * (up * cu + down * cd)
  const x = Math.sqrt(RS_FACTOR / Math.cbrt(rho))
  const zeta = Math.max(-1, Math.min(1, (up - down) / rho))

  let ec: number
  let rsDec: number
  let dEcDzeta: number
  if (zeta === 0) {
    vwnG(PARA, x, tmp, 0)
    ec = tmp[0]
    rsDec = tmp[1]
    dEcDzeta = 0
  } else {
    vwnG(PARA, x, tmp, 0)
    vwnG(FERRO, x, tmp, 2)
    vwnG(STIFF, x, tmp, 4)
    const p1 = Math.cbrt(1 + zeta)
    const m1 = Math.cbrt(1 - zeta)
    const fz = ((1 + zeta) * p1 + (1 - zeta) * m1 - 2) / F_DENOMINATOR
    const dfz = ((4 / 3) * (p1 - m1)) / F_DENOMINATOR
    const z3 = zeta * zeta * zeta
    const z4 = z3 * zeta
    const diff = tmp[2] - tmp[0]
    ec = tmp[0] + ((tmp[4] * fz) / FPP0) * (1 - z4) + diff * fz * z4
    rsDec = tmp[1] + ((tmp[5] * fz) / FPP0) * (1 - z4) + (tmp[3] - tmp[1]) * fz * z4
    dEcDzeta = (tmp[4] / FPP0) * (dfz * (1 - z4) - 4 * z3 * fz) + diff * (dfz * z4 + 4 * z3 * fz)
  }
  const common = ec - rsDec / 3
  out[0] = ex + rho * ec
  out[1] = VX * cu + common + (1 - zeta) * dEcDzeta
  out[2] = VX * cd + common - (1 + zeta) * dEcDzeta
}

/**
 * Exchange–correlation on a radial grid from spin densities given as p_σ = 4πr²ρ_σ. Fills
 * vUp/vDown (hartree) and returns E_xc = ∫ 4πr² e_xc dr using the weights dr.
 */
export function lsdOnGrid(
  r: Float64Array,
  dr: Float64Array,
  pUp: Float64Array,
  pDown: Float64Array,
  vUp: Float64Array,
  vDown: Float64Array,
): number {
  const out = new Float64Array(3)
  const tmp = new Float64Array(6)
  let energy = 0
  for (let i = 0; i < r.length; i++) {
    const shell = 4 * Math.PI * r[i] * r[i]
    lsdPoint(Math.max(0, pUp[i]) / shell, Math.max(0, pDown[i]) / shell, out, tmp)
    energy += dr[i] * shell * out[0]
    vUp[i] = out[1]
    vDown[i] = out[2]
  }
  return energy
}

/**
 * The correlation part alone of the local spin-density energy, ∫ 4πr² ρ·ε_c dr (hartree), for spin
 * densities given as p_σ = 4πr²ρ_σ: what hf-species.ts adds to a Hartree–Fock energy.
 */
export function lsdCorrelationOnGrid(r: Float64Array, dr: Float64Array, pUp: Float64Array, pDown: Float64Array): number {
  const out = new Float64Array(3)
  const tmp = new Float64Array(6)
  let energy = 0
  for (let i = 0; i < r.length; i++) {
    const shell = 4 * Math.PI * r[i] * r[i]
    const up = Math.max(0, pUp[i]) / shell
    const down = Math.max(0, pDown[i]) / shell
    lsdPoint(up, down, out, tmp)
    energy += dr[i] * shell * (out[0] - CX * (up * Math.cbrt(up) + down * Math.cbrt(down)))
  }
  return energy
}

/**
 * The same for a fully spin-polarised density p = 4πr²ρ↑ (ρ↓ = 0) over [0, end), the case of every
 * self-interaction term: only the ferromagnetic fit is needed, so it is written out here. Fills
 * the spin-up potential v and returns the energy.
 */
export function polarisedOnGrid(r: Float64Array, dr: Float64Array, p: Float64Array, end: number, v: Float64Array): number {
  const { a, x0, b, c, q, x0Term } = FERRO
  const atanFactor = (2 * b) / q
  const atanFactor0 = (2 * (b + 2 * x0)) / q
  let energy = 0
  for (let i = 0; i < end; i++) {
    const shell = 4 * Math.PI * r[i] * r[i]
    const rho = p[i] / shell
    if (!(rho > DENSITY_FLOOR)) {
      v[i] = 0
      continue
    }
    const cu = Math.cbrt(rho)
    const x = Math.sqrt(RS_FACTOR / cu)
    const X = x * x + b * x + c
    const at = Math.atan(q / (2 * x + b))
    const dx = x - x0
    const lnX = Math.log(X)
    const ec = a * (2 * Math.log(x) - lnX + atanFactor * at - x0Term * (2 * Math.log(Math.abs(dx)) - lnX + atanFactor0 * at))
    const rsDec = 0.5 * x * a * (2 / x - (2 * (x + b)) / X - x0Term * (2 / dx - (2 * (x + b + x0)) / X))
    energy += dr[i] * shell * rho * (CX * cu + ec)
    v[i] = VX * cu + ec - rsDec / 3
  }
  return energy
}
