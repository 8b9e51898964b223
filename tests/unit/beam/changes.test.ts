import { describe, expect, it } from 'vitest'
import { breedPlan, planChanges, stripPlan } from '../../../shared/beam/index'

describe('re-run differences', () => {
  const strip = stripPlan({ ion: '208Pb27+', energy: 4.2, medium: 'C', arealDensityUgCm2: 20 })
  const breed = breedPlan({ ion: 'Ne', electronEnergyEv: 2000, currentDensityACm2: 100 })

  it('lists nothing when the same inputs give the same answer', () => {
    const again = stripPlan({ ion: '208Pb27+', energy: 4.2, medium: 'C', arealDensityUgCm2: 20 })
    expect(planChanges({ strip, breed }, { strip: again, breed }, 54)).toEqual([])
  })

  it('names each number that moved, with both values', () => {
    const older = structuredClone(strip)
    older.engine = '0.9.0'
    older.models[2]!.meanCharge = 50
    older.models[2]!.fractions[54]!.fraction = 0.2
    older.rigidity.find((r) => r.charge === 54)!.tm = 1.2
    const olderBreed = structuredClone(breed)
    olderBreed.steps[3]!.crossSectionCm2 *= 2
    const changes = planChanges({ strip: older, breed: olderBreed }, { strip, breed }, 54)
    const what = changes.map((c) => c.what)
    expect(what).toEqual(expect.arrayContaining(['engine version', 'sayer-1977: mean charge', 'sayer-1977: fraction in 54+', 'Bρ of 54+ (T·m)', 'σ(3+ → 4+) (cm²)']))
    expect(changes.find((c) => c.what === 'sayer-1977: mean charge')).toEqual({ what: 'sayer-1977: mean charge', before: '50', after: String(Number(strip.models[2]!.meanCharge.toPrecision(4))) })
    expect(what).not.toContain('schiwietz-grande-2001: mean charge')
  })
})
