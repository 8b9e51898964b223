/**
 * Radioactive decay of the laboratory's sources: the activity today from a reference activity and
 * date, and the daughters that grow in where a chain matters.
 *
 * Decay: A(t) = A₀ · e^(−λt), λ = ln 2 / T½. Chains: the Bateman solution (H. Bateman, Proc. Camb.
 * Philos. Soc. 15, 423 (1910)) for a linear chain whose members other than the first are absent
 * at the reference date:
 *   Nₙ(t) = N₁(0) · (Πᵢ₌₁ⁿ⁻¹ λᵢ) · Σᵢ₌₁ⁿ e^(−λᵢt) / Πⱼ≠ᵢ (λⱼ − λᵢ),  Aₙ = λₙ Nₙ.
 * Daughters with branching < 1 carry their branching ratio as a factor.
 *
 * Half-lives: NUBASE2020, F. G. Kondev, M. Wang, W. J. Huang, S. Naimi, G. Audi, Chin. Phys. C 45,
 * 030001 (2021). The values below were recalled, not read from the table: each is marked
 * "from memory" and must be checked against NUBASE2020 (or DDEP) before the inventory is relied on.
 */

export const HALF_LIFE_SOURCE =
  'NUBASE2020, F. G. Kondev et al., Chin. Phys. C 45, 030001 (2021) — values recalled from memory, to be checked against the table'
export const BATEMAN_SOURCE = 'H. Bateman, Proc. Camb. Philos. Soc. 15, 423 (1910)'

const YEAR_S = 365.25 * 86_400 // the Julian year, as NUBASE converts years (common practice, no source)
const DAY_S = 86_400

export interface Nuclide {
  /** "U-238" */
  name: string
  halfLifeS: number
  /** how the half-life is known: every entry here is "from memory" until checked */
  note: 'from memory'
  /** daughters worth carrying in an inventory: short-lived members that grow into equilibrium */
  daughters?: readonly { name: string; branching: number }[]
}

const y = (v: number) => v * YEAR_S
const d = (v: number) => v * DAY_S

/** Half-lives of the nuclides a target laboratory meets as sources (NUBASE2020, from memory). */
export const NUCLIDES: Record<string, Nuclide> = {
  'H-3': { name: 'H-3', halfLifeS: y(12.32), note: 'from memory' },
  'C-14': { name: 'C-14', halfLifeS: y(5700), note: 'from memory' },
  'Na-22': { name: 'Na-22', halfLifeS: y(2.6018), note: 'from memory' },
  'Fe-55': { name: 'Fe-55', halfLifeS: y(2.747), note: 'from memory' },
  'Co-57': { name: 'Co-57', halfLifeS: d(271.74), note: 'from memory' },
  'Co-60': { name: 'Co-60', halfLifeS: y(5.2711), note: 'from memory' },
  'Ni-63': { name: 'Ni-63', halfLifeS: y(101.2), note: 'from memory' },
  'Sr-90': { name: 'Sr-90', halfLifeS: y(28.91), note: 'from memory', daughters: [{ name: 'Y-90', branching: 1 }] },
  'Y-90': { name: 'Y-90', halfLifeS: 64.05 * 3600, note: 'from memory' },
  'Cd-109': { name: 'Cd-109', halfLifeS: d(461.9), note: 'from memory' },
  'Ba-133': { name: 'Ba-133', halfLifeS: y(10.551), note: 'from memory' },
  'Cs-137': { name: 'Cs-137', halfLifeS: y(30.08), note: 'from memory' },
  'Eu-152': { name: 'Eu-152', halfLifeS: y(13.517), note: 'from memory' },
  'Ra-226': { name: 'Ra-226', halfLifeS: y(1600), note: 'from memory' },
  'Th-232': { name: 'Th-232', halfLifeS: y(1.40e10), note: 'from memory' },
  'Th-234': { name: 'Th-234', halfLifeS: d(24.1), note: 'from memory', daughters: [{ name: 'Pa-234m', branching: 1 }] },
  'Pa-234m': { name: 'Pa-234m', halfLifeS: 1.159 * 60, note: 'from memory' },
  'U-234': { name: 'U-234', halfLifeS: y(2.455e5), note: 'from memory' },
  'U-235': { name: 'U-235', halfLifeS: y(7.04e8), note: 'from memory' },
  // Depleted uranium: ²³⁴Th and ²³⁴ᵐPa reach secular equilibrium with ²³⁸U within months of separation.
  'U-238': { name: 'U-238', halfLifeS: y(4.468e9), note: 'from memory', daughters: [{ name: 'Th-234', branching: 1 }] },
  'Pu-239': { name: 'Pu-239', halfLifeS: y(24110), note: 'from memory' },
  'Am-241': { name: 'Am-241', halfLifeS: y(432.6), note: 'from memory' },
  'Cf-252': { name: 'Cf-252', halfLifeS: y(2.645), note: 'from memory' },
}

/** Decay constant λ = ln 2 / T½, 1/s. */
export const lambda = (halfLifeS: number) => Math.LN2 / halfLifeS


/**
 * Activities of every member of a linear chain `seconds` after the reference, when only the
 * first member (activity a0) was present then: the Bateman solution, as activities.
 * `halfLives` lists the chain in order; `branchings[i]` is the fraction of member i decaying to i + 1.
 */
export function batemanActivities(a0: number, halfLives: readonly number[], seconds: number, branchings: readonly number[] = []): number[] {
  const l = halfLives.map(lambda)
  const n0 = a0 / l[0]!
  return l.map((ln, n) => {
    let sum = 0
    for (let i = 0; i <= n; i++) {
      let denominator = 1
      for (let j = 0; j <= n; j++) if (j !== i) denominator *= l[j]! - l[i]!
      sum += Math.exp(-l[i]! * seconds) / denominator
    }
    let product = 1
    for (let i = 0; i < n; i++) product *= l[i]! * (branchings[i] ?? 1)
    return ln * n0 * product * sum
  })
}

/**
 * The activity `seconds` after a reference activity `a0` (any unit), for half-life `halfLifeS`:
 * the chain of one member, so the decay law is written once, in batemanActivities.
 */
export function decayed(a0: number, halfLifeS: number, seconds: number): number {
  return batemanActivities(a0, [halfLifeS], seconds)[0]!
}

/** The chain carried for a nuclide: itself and the daughters the table names, in order. */
export function chainOf(name: string): Nuclide[] {
  const chain: Nuclide[] = []
  let next: Nuclide | undefined = NUCLIDES[name]
  while (next && chain.length < 6) {
    chain.push(next)
    const daughter: { name: string; branching: number } | undefined = next.daughters?.[0]
    next = daughter ? NUCLIDES[daughter.name] : undefined
  }
  return chain
}

export interface ActivityToday {
  nuclide: string
  activityBq: number
  /** members grown in since the reference date (absent then): name and activity */
  daughters: { nuclide: string; activityBq: number }[]
  /** false when the nuclide is not in the table: the recorded activity is shown undecayed */
  known: boolean
}

/**
 * The activity of a source on `on` from its reference activity on `reference` (ISO dates or
 * timestamps), with its daughters by Bateman grow-in. An unknown nuclide keeps its recorded value.
 */
export function activityOn(nuclide: string, referenceBq: number, reference: string | Date, on: string | Date): ActivityToday {
  const chain = chainOf(nuclide)
  if (!chain.length) return { nuclide, activityBq: referenceBq, daughters: [], known: false }
  const seconds = Math.max(0, (new Date(on).getTime() - new Date(reference).getTime()) / 1000)
  const branchings = chain.slice(0, -1).map((m) => m.daughters?.[0]?.branching ?? 1)
  const activities = batemanActivities(referenceBq, chain.map((m) => m.halfLifeS), seconds, branchings)
  return {
    nuclide,
    activityBq: activities[0]!,
    daughters: chain.slice(1).map((m, i) => ({ nuclide: m.name, activityBq: activities[i + 1]! })),
    known: true,
  }
}
