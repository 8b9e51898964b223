import { IdParam } from '../../schemas/common'
import { BeamPlanBody, BeamPlanListQuery, BeamStockQuery, BreedingQuery, ChargeStatesQuery } from '../../schemas/beam'
import { routes } from '../types'

export default routes([
  { method: 'GET', path: '/api/beam/charge-states', summary: 'Equilibrium charge states after a stripper, with rigidities and energy loss', description: 'Several published formulas side by side, each with its paper, range and warnings. Estimates.', access: 'readBeamPlans', query: ChargeStatesQuery, answer: { description: '{ion, energyMeVPerU, medium, models, notApplicable, rigidity, energyLoss?}; `notApplicable` lists the formulas that give no number for this stripper (e.g. a solid-only formula and a gas) with the reason' } },
  { method: 'GET', path: '/api/beam/breeding', summary: 'Charge breeding in an electron-beam ion source (Lotz cross-sections, j·τ, populations)', access: 'readBeamPlans', query: BreedingQuery, answer: { description: '{ion, electronEnergyEv, currentDensityACm2, steps, breeding, …}' } },
  { method: 'GET', path: '/api/beam/stock', summary: 'Stripper foils in stock, and samples able to source an element ranked by enrichment', access: 'readBeamPlans', query: BeamStockQuery, answer: { description: '{foils, sources}' } },
  { method: 'GET', path: '/api/beam/plans', summary: 'Saved beam plans', description: '`format=csv` answers CSV.', access: 'readBeamPlans', query: BeamPlanListQuery, answer: { description: 'A page of saved plans (or CSV)' } },
  { method: 'POST', path: '/api/beam/plans', summary: 'Save a beam plan (inputs, every result, engine version)', access: 'planBeams', body: BeamPlanBody, answer: { status: 201, description: 'The saved plan' } },
  { method: 'GET', path: '/api/beam/plans/{id}', summary: 'One saved beam plan with its frozen results', access: 'readBeamPlans', params: IdParam, answer: { description: 'The plan' } },
  { method: 'GET', path: '/api/beam/plans/{id}/rerun', summary: 'A saved plan run again on the current engine, with the differences', access: 'readBeamPlans', params: IdParam, answer: { description: '{storedEngine, currentEngine, result, changes}' } },
])
