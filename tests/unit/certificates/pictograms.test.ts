import { describe, it, expect } from 'vitest'
import { pictogramsFor } from '../../../shared/labels/pictograms'

// Hazard statement → pictogram, as UN GHS Rev. 10 (2023) Annex 1 allocates them (from memory).
const CASES: Array<[string[], string[]]> = [
  [['H201'], ['GHS01']],
  [['H225'], ['GHS02']],
  [['H261'], ['GHS02']],
  [['H272'], ['GHS03']],
  [['H280'], ['GHS04']],
  [['H314'], ['GHS05']],
  [['H300'], ['GHS06']],
  [['H302'], ['GHS07']],
  [['H350i'], ['GHS08']],
  [['H360FD'], ['GHS08']],
  [['H410'], ['GHS09']],
  [['H241'], ['GHS01', 'GHS02']],
  [['H282'], ['GHS02', 'GHS04']],
  // categories that carry no symbol
  [['H227', 'H303', 'H412', 'H413'], []],
  // the skull and crossbones takes precedence over the exclamation mark (GHS 1.4.10.5.3.1, from memory)
  [['H301', 'H315', 'H319'], ['GHS06']],
  [['H317', 'H351', 'H372'], ['GHS07', 'GHS08']],
  [['H330', 'H341', 'H350', 'H361fd', 'H372', 'H410'], ['GHS06', 'GHS08', 'GHS09']],
]

describe('GHS pictograms from hazard statements', () => {
  it.each(CASES)('%j → %j', (codes, expected) => {
    expect(pictogramsFor(codes)).toEqual(expected)
  })

  it('names each pictogram once, whatever the number of statements behind it', () => {
    expect(pictogramsFor(['H300', 'H310', 'H330', 'H301'])).toEqual(['GHS06'])
  })
})
