/**
 * GHS hazard pictograms (GHS01 … GHS09) from the hazard statements of a sample.
 *
 * Source: UN GHS Rev. 10 (2023), Annex 1 (allocation of label elements) with the statement
 * codes of Annex 3 — written down from memory, not copied from the document. Statements whose
 * category carries no symbol (e.g. H227, H303, H305, H401, H412) map to none. Precedence as in
 * GHS 1.4.10.5.3.1 (from memory): where the skull and crossbones applies, the exclamation mark
 * is left off.
 */
import { baseHCode } from '../samples/ghs'

export const PICTOGRAM_SOURCE = 'UN GHS Rev. 10 (2023), Annex 1 and Annex 3 — from memory'

export const PICTOGRAM_NAMES = {
  GHS01: 'Exploding bomb',
  GHS02: 'Flame',
  GHS03: 'Flame over circle',
  GHS04: 'Gas cylinder',
  GHS05: 'Corrosion',
  GHS06: 'Skull and crossbones',
  GHS07: 'Exclamation mark',
  GHS08: 'Health hazard',
  GHS09: 'Environment',
} as const
export type Pictogram = keyof typeof PICTOGRAM_NAMES

const BY_CODE: Record<string, Pictogram[]> = {
  // explosives, self-reactive substances and organic peroxides types A and B
  H200: ['GHS01'], H201: ['GHS01'], H202: ['GHS01'], H203: ['GHS01'], H204: ['GHS01'], H209: ['GHS01'], H210: ['GHS01'], H211: ['GHS01'],
  H240: ['GHS01'], H241: ['GHS01', 'GHS02'],
  // desensitised explosives, flammables, pyrophorics, self-heating and water-reactive substances
  H206: ['GHS02'], H207: ['GHS02'], H208: ['GHS02'],
  H220: ['GHS02'], H221: ['GHS02'], H222: ['GHS02'], H223: ['GHS02'], H224: ['GHS02'], H225: ['GHS02'], H226: ['GHS02'], H228: ['GHS02'],
  H232: ['GHS02'], H242: ['GHS02'], H250: ['GHS02'], H251: ['GHS02'], H252: ['GHS02'], H260: ['GHS02'], H261: ['GHS02'],
  // oxidisers
  H270: ['GHS03'], H271: ['GHS03'], H272: ['GHS03'],
  // gases and chemicals under pressure
  H280: ['GHS04'], H281: ['GHS04'], H282: ['GHS02', 'GHS04'], H283: ['GHS02', 'GHS04'], H284: ['GHS04'],
  // corrosive to metals, skin corrosion, serious eye damage
  H290: ['GHS05'], H314: ['GHS05'], H318: ['GHS05'],
  // acute toxicity categories 1 to 3
  H300: ['GHS06'], H301: ['GHS06'], H310: ['GHS06'], H311: ['GHS06'], H330: ['GHS06'], H331: ['GHS06'],
  // acute toxicity category 4, irritation, skin sensitisation, narcotic effects, ozone layer
  H302: ['GHS07'], H312: ['GHS07'], H332: ['GHS07'], H315: ['GHS07'], H317: ['GHS07'], H319: ['GHS07'], H335: ['GHS07'], H336: ['GHS07'], H420: ['GHS07'],
  // aspiration, respiratory sensitisation, CMR, specific target organ toxicity
  H304: ['GHS08'], H334: ['GHS08'], H340: ['GHS08'], H341: ['GHS08'], H350: ['GHS08'], H351: ['GHS08'], H360: ['GHS08'], H361: ['GHS08'],
  H370: ['GHS08'], H371: ['GHS08'], H372: ['GHS08'], H373: ['GHS08'],
  // hazardous to the aquatic environment, acute 1 and chronic 1–2
  H400: ['GHS09'], H410: ['GHS09'], H411: ['GHS09'],
}

/** The pictograms a sample's hazard statements call for, in code order, each once. */
export function pictogramsFor(hazardStatements: readonly string[]): Pictogram[] {
  const found = new Set<Pictogram>()
  for (const code of hazardStatements) for (const p of BY_CODE[baseHCode(code) ?? ''] ?? []) found.add(p)
  if (found.has('GHS06')) found.delete('GHS07')
  return [...found].sort()
}
