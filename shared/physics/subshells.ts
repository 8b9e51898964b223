/**
 * Subshells (n, l, occupancy) and the text forms of a configuration: canonical "1s2 2s2 2p6" and
 * noble-gas core "[Ne] 3s2 3p1".
 */

export interface Subshell {
  n: number
  /** 0 = s, 1 = p, 2 = d, 3 = f, … */
  l: number
  electrons: number
}

// Subshell letters after f run alphabetically without j (common practice, no source).
const SUBSHELL_LETTERS = 'spdfghik'

/** The letter of orbital angular momentum l for a subshell ('s', 'p', 'd', …). */
export function subshellLetter(l: number): string {
  const letter = SUBSHELL_LETTERS[l]
  if (letter === undefined) throw new RangeError(`no subshell letter for l = ${l}`)
  return letter
}

/** Maximum occupancy of a subshell, 2(2l + 1). */
export function capacity(l: number): number {
  return 2 * (2 * l + 1)
}

/** '3d' for n = 3, l = 2. */
export function subshellLabel(n: number, l: number): string {
  return `${n}${subshellLetter(l)}`
}

/** Sorted by n then l, without empty subshells: the canonical order of DESIGN §5. */
export function canonical(subshells: readonly Subshell[]): Subshell[] {
  return subshells
    .filter((s) => s.electrons > 0)
    .map((s) => ({ n: s.n, l: s.l, electrons: s.electrons }))
    .sort((a, b) => a.n - b.n || a.l - b.l)
}

/** Total electrons. */
export function electronCount(subshells: readonly Subshell[]): number {
  return subshells.reduce((sum, s) => sum + s.electrons, 0)
}

// Labels by n * 8 + l, built once: formatting runs for every species of a full listing.
const LABELS: string[] = []
for (let n = 1; n <= 9; n++) for (let l = 0; l < SUBSHELL_LETTERS.length; l++) LABELS[n * 8 + l] = `${n}${SUBSHELL_LETTERS[l]}`

function isCanonical(subshells: readonly Subshell[]): boolean {
  for (let i = 0; i < subshells.length; i++) {
    const s = subshells[i]
    const prev = subshells[i - 1]
    if (s.electrons <= 0 || (prev && (prev.n > s.n || (prev.n === s.n && prev.l >= s.l)))) return false
  }
  return true
}

/** '1s2 2s2 2p6 3s2 3p1' (every occupied subshell with its count, even 1). */
export function formatConfiguration(subshells: readonly Subshell[]): string {
  const list = isCanonical(subshells) ? subshells : canonical(subshells)
  let out = ''
  for (const s of list) out += `${out ? ' ' : ''}${LABELS[s.n * 8 + s.l] ?? subshellLabel(s.n, s.l)}${s.electrons}`
  return out
}

/**
 * Madelung (n + l, then n) order, the order in which a neutral atom fills. n + l ≤ 8 reaches 8s,
 * enough for 119 electrons (the anion of element 118).
 */
export const MADELUNG_ORDER: readonly (readonly [number, number])[] = (() => {
  const out: [number, number][] = []
  for (let sum = 1; sum <= 8; sum++) {
    for (let n = 1; n <= sum; n++) {
      const l = sum - n
      if (l < n && l <= 3) out.push([n, l])
    }
  }
  return out
})()

/** Fills `count` electrons into subshells in the given (n, l) order. */
export function fillInOrder(count: number, order: readonly (readonly [number, number])[]): Subshell[] {
  const out: Subshell[] = []
  let left = count
  for (const [n, l] of order) {
    if (left <= 0) break
    const k = Math.min(left, capacity(l))
    out.push({ n, l, electrons: k })
    left -= k
  }
  if (left > 0) throw new RangeError(`cannot place ${count} electrons`)
  return canonical(out)
}

// Closed-shell atoms used as cores: every one of them fills in Madelung order.
export const NOBLE_GASES: readonly { symbol: string; electrons: number }[] = [
  { symbol: 'He', electrons: 2 },
  { symbol: 'Ne', electrons: 10 },
  { symbol: 'Ar', electrons: 18 },
  { symbol: 'Kr', electrons: 36 },
  { symbol: 'Xe', electrons: 54 },
  { symbol: 'Rn', electrons: 86 },
  { symbol: 'Og', electrons: 118 },
]
const CORES = NOBLE_GASES.map((g) => {
  const subshells = fillInOrder(g.electrons, MADELUNG_ORDER)
  // Electrons each core holds by n * 8 + l, for look-ups without searching.
  const full = new Uint8Array(80)
  for (const c of subshells) full[c.n * 8 + c.l] = c.electrons
  return { ...g, subshells, full }
})

function coreInside(core: (typeof CORES)[number], subshells: readonly Subshell[]): boolean {
  let matched = 0
  for (const s of subshells) {
    const need = core.full[s.n * 8 + s.l]
    if (need > 0 && s.electrons >= need) matched++
  }
  return matched === core.subshells.length
}

/** The largest closed-shell core wholly inside the configuration and smaller than it, if any. */
export function largestCore(
  subshells: readonly Subshell[],
): { symbol: string; electrons: number; subshells: readonly Subshell[] } | null {
  const total = electronCount(subshells)
  for (let i = CORES.length - 1; i >= 0; i--) {
    const core = CORES[i]
    if (core.electrons < total && coreInside(core, subshells)) return core
  }
  return null
}

/**
 * '[Ne] 3s2 3p1'. The core is the largest closed-shell atom wholly contained and smaller than the
 * species (so argon itself is '[Ne] 3s2 3p6'); with no such core the canonical form is returned,
 * and a bare nucleus gives ''.
 */
export function formatWithCore(subshells: readonly Subshell[]): string {
  const list = isCanonical(subshells) ? subshells : canonical(subshells)
  const total = electronCount(list)
  let core: (typeof CORES)[number] | null = null
  for (let i = CORES.length - 1; i >= 0 && !core; i--) if (CORES[i].electrons < total && coreInside(CORES[i], list)) core = CORES[i]
  if (!core) return formatConfiguration(list)
  let out = `[${core.symbol}]`
  for (const s of list) if (core.full[s.n * 8 + s.l] === 0) out += ` ${LABELS[s.n * 8 + s.l]}${s.electrons}`
  return out
}

/** Parses '1s2 2s2 2p1', '[Ar] 3d6 4s2' or '4f 5d2' (a missing count means 1). */
export function parseConfiguration(text: string): Subshell[] {
  const out: Subshell[] = []
  for (const token of text.trim().split(/\s+/).filter(Boolean)) {
    const core = /^\[([A-Z][a-z]?)\]$/.exec(token)
    if (core) {
      const gas = CORES.find((g) => g.symbol === core[1])
      if (!gas) throw new SyntaxError(`unknown core [${core[1]}]`)
      out.push(...gas.subshells)
      continue
    }
    const m = /^(\d+)([spdfghik])(\d*)$/.exec(token)
    if (!m) throw new SyntaxError(`not a subshell: ${token.slice(0, 12)}`)
    const n = Number(m[1])
    const l = SUBSHELL_LETTERS.indexOf(m[2])
    const electrons = m[3] === '' ? 1 : Number(m[3])
    if (l >= n || electrons > capacity(l)) throw new SyntaxError(`impossible subshell: ${token.slice(0, 12)}`)
    out.push({ n, l, electrons })
  }
  return canonical(out)
}
