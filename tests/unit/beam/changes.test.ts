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
    const sayer = older.models.find((m) => m.model === 'sayer-1977')!
    sayer.meanCharge = 50
    sayer.fractions[54]!.fraction = 0.2
    older.rigidity.find((r) => r.charge === 54)!.tm = 1.2
    const olderBreed = structuredClone(breed)
    olderBreed.steps[3]!.crossSectionCm2 *= 2
    const changes = planChanges({ strip: older, breed: olderBreed }, { strip, breed }, 54)
    const what = changes.map((c) => c.what)
    expect(what).toEqual(expect.arrayContaining(['engine version', 'sayer-1977: mean charge', 'sayer-1977: fraction in 54+', 'Bρ of 54+ (T·m)', 'σ(3+ → 4+) (cm²)']))
    const now = strip.models.find((m) => m.model === 'sayer-1977')!
    expect(changes.find((c) => c.what === 'sayer-1977: mean charge')).toEqual({ what: 'sayer-1977: mean charge', before: '50', after: String(Number(now.meanCharge.toPrecision(4))) })
    expect(what).not.toContain('schiwietz-grande-2001: mean charge')
  })

  it('names a formula a newer engine adds, or finds not applicable, against a plan saved without it', () => {
    // A plan saved by engine 1.0.0 had neither the 2004 formula nor the notApplicable list.
    const asSaved = (p: typeof strip) => {
      const old = structuredClone(p)
      old.engine = '1.0.0'
      old.models = old.models.filter((m) => m.model !== 'schiwietz-grande-2004')
      delete old.notApplicable
      return old
    }
    const solid = planChanges({ strip: asSaved(strip), breed: null }, { strip, breed: null }, 54)
    expect(solid).toContainEqual({ what: 'model schiwietz-grande-2004', before: 'absent', after: 'present' })
    const gas = stripPlan({ ion: '12C1-', energy: 0.21, medium: 'Ar', gas: true })
    const gasChanges = planChanges({ strip: asSaved(gas), breed: null }, { strip: gas, breed: null }, 3)
    expect(gasChanges).toContainEqual({ what: 'model schiwietz-grande-2004', before: 'absent', after: 'not applicable' })
    expect(gasChanges.filter((c) => c.what.startsWith('schiwietz-grande-2001'))).toEqual([])
  })
})
