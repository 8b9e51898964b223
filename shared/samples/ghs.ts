/**
 * GHS hazard statements (H-codes) with their short statement texts.
 *
 * Source: UN Globally Harmonized System of Classification and Labelling of Chemicals (GHS),
 * Rev. 10 (2023), Annex 3, Section 1 (codification of hazard statements) — written down from
 * memory, not copied from the document, so an entry may differ in wording from the printed text.
 * Combined statements (e.g. "H300+H310") are accepted by splitting them into their parts. The
 * letter-suffixed variants below are not GHS codes but the EU CLP refinements that supplier
 * safety data sheets in Europe print (H350i, H360FD …); they are accepted and stored as written.
 */
export const GHS_SOURCE = 'UN GHS Rev. 10 (2023), Annex 3 — from memory'

export const GHS_STATEMENTS: Readonly<Record<string, string>> = {
  // physical hazards
  H200: 'Unstable explosive',
  H201: 'Explosive; mass explosion hazard',
  H202: 'Explosive; severe projection hazard',
  H203: 'Explosive; fire, blast or projection hazard',
  H204: 'Fire or projection hazard',
  H205: 'May mass explode in fire',
  H206: 'Fire, blast or projection hazard; increased risk of explosion if desensitizing agent is reduced',
  H207: 'Fire or projection hazard; increased risk of explosion if desensitizing agent is reduced',
  H208: 'Fire hazard; increased risk of explosion if desensitizing agent is reduced',
  H209: 'Explosive',
  H210: 'Very sensitive',
  H211: 'May be sensitive',
  H220: 'Extremely flammable gas',
  H221: 'Flammable gas',
  H222: 'Extremely flammable aerosol',
  H223: 'Flammable aerosol',
  H224: 'Extremely flammable liquid and vapour',
  H225: 'Highly flammable liquid and vapour',
  H226: 'Flammable liquid and vapour',
  H227: 'Combustible liquid',
  H228: 'Flammable solid',
  H229: 'Pressurized container: may burst if heated',
  H230: 'May react explosively even in the absence of air',
  H231: 'May react explosively even in the absence of air at elevated pressure and/or temperature',
  H232: 'May ignite spontaneously if exposed to air',
  H240: 'Heating may cause an explosion',
  H241: 'Heating may cause a fire or explosion',
  H242: 'Heating may cause a fire',
  H250: 'Catches fire spontaneously if exposed to air',
  H251: 'Self-heating; may catch fire',
  H252: 'Self-heating in large quantities; may catch fire',
  H260: 'In contact with water releases flammable gases which may ignite spontaneously',
  H261: 'In contact with water releases flammable gas',
  H270: 'May cause or intensify fire; oxidizer',
  H271: 'May cause fire or explosion; strong oxidizer',
  H272: 'May intensify fire; oxidizer',
  H280: 'Contains gas under pressure; may explode if heated',
  H281: 'Contains refrigerated gas; may cause cryogenic burns or injury',
  H282: 'Extremely flammable chemical under pressure: may explode if heated',
  H283: 'Flammable chemical under pressure: may explode if heated',
  H284: 'Chemical under pressure: may explode if heated',
  H290: 'May be corrosive to metals',
  // health hazards
  H300: 'Fatal if swallowed',
  H301: 'Toxic if swallowed',
  H302: 'Harmful if swallowed',
  H303: 'May be harmful if swallowed',
  H304: 'May be fatal if swallowed and enters airways',
  H305: 'May be harmful if swallowed and enters airways',
  H310: 'Fatal in contact with skin',
  H311: 'Toxic in contact with skin',
  H312: 'Harmful in contact with skin',
  H313: 'May be harmful in contact with skin',
  H314: 'Causes severe skin burns and eye damage',
  H315: 'Causes skin irritation',
  H316: 'Causes mild skin irritation',
  H317: 'May cause an allergic skin reaction',
  H318: 'Causes serious eye damage',
  H319: 'Causes serious eye irritation',
  H320: 'Causes eye irritation',
  H330: 'Fatal if inhaled',
  H331: 'Toxic if inhaled',
  H332: 'Harmful if inhaled',
  H333: 'May be harmful if inhaled',
  H334: 'May cause allergy or asthma symptoms or breathing difficulties if inhaled',
  H335: 'May cause respiratory irritation',
  H336: 'May cause drowsiness or dizziness',
  H340: 'May cause genetic defects',
  H341: 'Suspected of causing genetic defects',
  H350: 'May cause cancer',
  H351: 'Suspected of causing cancer',
  H360: 'May damage fertility or the unborn child',
  H361: 'Suspected of damaging fertility or the unborn child',
  H362: 'May cause harm to breast-fed children',
  H370: 'Causes damage to organs',
  H371: 'May cause damage to organs',
  H372: 'Causes damage to organs through prolonged or repeated exposure',
  H373: 'May cause damage to organs through prolonged or repeated exposure',
  // environmental hazards
  H400: 'Very toxic to aquatic life',
  H401: 'Toxic to aquatic life',
  H402: 'Harmful to aquatic life',
  H410: 'Very toxic to aquatic life with long lasting effects',
  H411: 'Toxic to aquatic life with long lasting effects',
  H412: 'Harmful to aquatic life with long lasting effects',
  H413: 'May cause long lasting harmful effects to aquatic life',
  H420: 'Harms public health and the environment by destroying ozone in the upper atmosphere',
}

/** EU CLP letter-suffixed variants (from memory), each with the GHS code it refines. */
export const CLP_VARIANTS: Readonly<Record<string, { base: string; text: string }>> = {
  H350i: { base: 'H350', text: 'May cause cancer by inhalation' },
  H360F: { base: 'H360', text: 'May damage fertility' },
  H360D: { base: 'H360', text: 'May damage the unborn child' },
  H360FD: { base: 'H360', text: 'May damage fertility. May damage the unborn child' },
  H360Fd: { base: 'H360', text: 'May damage fertility. Suspected of damaging the unborn child' },
  H360Df: { base: 'H360', text: 'May damage the unborn child. Suspected of damaging fertility' },
  H361f: { base: 'H361', text: 'Suspected of damaging fertility' },
  H361d: { base: 'H361', text: 'Suspected of damaging the unborn child' },
  H361fd: { base: 'H361', text: 'Suspected of damaging fertility. Suspected of damaging the unborn child' },
}

// In the CLP suffixes the letter case carries meaning (H360Fd: F category 1, d category 2), so a
// code is matched exactly first, and in any letter case only where that names one code alone.
const ALL_CODES = new Set([...Object.keys(GHS_STATEMENTS), ...Object.keys(CLP_VARIANTS)])
const BY_UPPER = new Map<string, string | null>()
for (const code of ALL_CODES) BY_UPPER.set(code.toUpperCase(), BY_UPPER.has(code.toUpperCase()) ? null : code)

/** The stored spelling of an H-code ("h350I" → "H350i"; "h360fd" is ambiguous, so null), or null. */
export function canonicalHCode(code: string): string | null {
  const t = code.trim().replace(/^h/, 'H')
  if (ALL_CODES.has(t)) return t
  return BY_UPPER.get(t.toUpperCase()) ?? null
}

/** The GHS code a statement belongs to ("H360FD" → "H360"); unknown codes give null. */
export function baseHCode(code: string): string | null {
  const c = canonicalHCode(code)
  if (!c) return null
  return CLP_VARIANTS[c]?.base ?? c
}

/** The statement text of a code, or null when the code is not in the list. */
export function hazardStatementText(code: string): string | null {
  const c = canonicalHCode(code)
  if (!c) return null
  return GHS_STATEMENTS[c] ?? CLP_VARIANTS[c]?.text ?? null
}

/**
 * Splits what a person typed ("H300+H310, h350i; H225") into single codes in stored spelling.
 * `unknown` lists the pieces that are no known code, as typed.
 */
export function parseHazardStatements(input: string | readonly string[]): { codes: string[]; unknown: string[] } {
  const pieces = (typeof input === 'string' ? [input] : input).flatMap((s) => s.split(/[\s,;+]+/)).filter(Boolean)
  const codes: string[] = []
  const unknown: string[] = []
  for (const piece of pieces) {
    const c = canonicalHCode(piece)
    if (!c) unknown.push(piece)
    else if (!codes.includes(c)) codes.push(c)
  }
  return { codes, unknown }
}
