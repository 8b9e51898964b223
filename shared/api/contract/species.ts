import { IdParam } from '../../schemas/common'
import { CompareQuery, LinkSampleBody, RecordSpeciesBody, SpeciesListQuery, SpeciesLookupQuery, SpeciesSampleParams, SpeciesSeriesQuery } from '../../schemas/species'
import { routes } from '../types'

export default routes([
  { method: 'GET', path: '/api/species/lookup', summary: 'Look up an ion species (e.g. Fe XIV, Fe13+, U 92+)', description: 'Computed values are estimates; each comes with its reference value where one exists.', access: 'lookUpSpecies', query: SpeciesLookupQuery, answer: { description: 'The species record: configuration, term, ionisation and binding energies' } },
  { method: 'GET', path: '/api/species/series', summary: 'Every charge state of one element', access: 'lookUpSpecies', query: SpeciesSeriesQuery, answer: { description: 'Per charge state: estimates beside reference values' } },
  { method: 'GET', path: '/api/species/compare', summary: 'Compare species side by side', description: '`format=csv` answers CSV.', access: 'lookUpSpecies', query: CompareQuery, answer: { description: 'The compared species (or CSV)' } },
  { method: 'GET', path: '/api/species', summary: 'Recorded species', description: '`format=csv` answers CSV.', access: 'lookUpSpecies', query: SpeciesListQuery, answer: { description: 'A page of recorded species (or CSV)' } },
  { method: 'POST', path: '/api/species', summary: 'Record a species (freezes its computed record)', access: 'recordSpecies', body: RecordSpeciesBody, answer: { status: 201, description: 'The recorded species' } },
  { method: 'GET', path: '/api/species/{id}', summary: 'One recorded species with its frozen results', access: 'lookUpSpecies', params: IdParam, answer: { description: 'The recorded species' } },
  { method: 'POST', path: '/api/species/{id}/samples', summary: 'Link a sample to a recorded species', access: 'recordSpecies', params: IdParam, body: LinkSampleBody, answer: { status: 201, description: 'The link' }, errors: { 409: 'Already linked' } },
  { method: 'DELETE', path: '/api/species/{id}/samples/{sampleId}', summary: 'Unlink a sample from a recorded species', access: 'recordSpecies', params: SpeciesSampleParams, answer: { description: 'Unlinked' } },
])
