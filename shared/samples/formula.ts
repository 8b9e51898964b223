import { getElement } from '../physics/index'

/**
 * Checks a chemical formula as labs write it: element symbols with optional counts, parentheses
 * and brackets, and hydrate dots ("CaCO3", "Ni", "Ca(OH)2", "CuSO4·5H2O", "UO2.5"). Answers the
 * problem in words, or null when it reads well. Only the symbols are checked against the
 * elements; stoichiometry is the recorder's business.
 */
export function formulaProblem(formula: string): string | null {
  const f = formula.trim()
  if (!f) return null
  if (!/^[A-Za-z0-9()[\]·.\s+-]+$/.test(f)) return 'A formula may contain element symbols, numbers, parentheses and a hydrate dot (·) only'
  let depth = 0
  for (const ch of f) {
    if (ch === '(' || ch === '[') depth++
    if (ch === ')' || ch === ']') depth--
    if (depth < 0) break
  }
  if (depth !== 0) return 'The parentheses in the formula do not pair up'
  const symbols = f.match(/[A-Z][a-z]?/g) ?? []
  if (!symbols.length) return 'A formula needs at least one element symbol, starting with a capital letter'
  const stray = f.replace(/[A-Z][a-z]?/g, '').match(/[a-z]/)
  if (stray) return 'Element symbols start with a capital letter (e.g. Ni, not ni)'
  const unknown = symbols.find((s) => getElement(s)?.symbol !== s)
  if (unknown) return `"${unknown}" is not an element symbol`
  return null
}

/** The distinct element numbers a formula names, in order of appearance. */
export function formulaElements(formula: string): number[] {
  const out: number[] = []
  for (const s of formula.match(/[A-Z][a-z]?/g) ?? []) {
    const z = getElement(s)?.symbol === s ? getElement(s)!.z : null
    if (z !== null && !out.includes(z)) out.push(z)
  }
  return out
}
