import { IdParam } from '../../schemas/common'
import { CustodyBody } from '../../schemas/custody'
import { CodeParam, DeleteSampleQuery, ImportQuery, LocationBody, SampleBody, SampleListQuery, SamplePatchBody } from '../../schemas/samples'
import { routes } from '../types'

const LOCK = { 409: 'Changed by someone else since you read it (version)' }

export default routes([
  { method: 'GET', path: '/api/samples', summary: 'List and search samples', description: '`format=csv` answers the whole filtered list as CSV.', access: 'readSamples', query: SampleListQuery, answer: { description: 'A page of samples (or CSV)' } },
  { method: 'POST', path: '/api/samples', summary: 'Register a sample', access: 'manageSamples', body: SampleBody, answer: { status: 201, description: 'The sample with its code' } },
  { method: 'GET', path: '/api/samples/{id}', summary: 'One sample with its composition, hazards and place', access: 'readSamples', params: IdParam, answer: { description: 'The sample' } },
  { method: 'PATCH', path: '/api/samples/{id}', summary: 'Change a sample (send its version)', access: 'manageSamples', params: IdParam, body: SamplePatchBody, answer: { description: 'The sample' }, errors: LOCK },
  { method: 'DELETE', path: '/api/samples/{id}', summary: 'Delete a sample never certified, labelled or moved', access: 'manageSamples', params: IdParam, query: DeleteSampleQuery, answer: { description: 'Deleted' }, errors: { ...LOCK } },
  { method: 'GET', path: '/api/samples/by-code/{code}', summary: 'A sample by its code (S-YYYY-NNNNNN), e.g. from a label', access: 'readSamples', params: CodeParam, answer: { description: 'The sample' } },
  { method: 'GET', path: '/api/samples/{id}/history', summary: 'The audit trail of one sample', access: 'readSamples', params: IdParam, answer: { description: 'Its audit rows, newest first' } },
  { method: 'GET', path: '/api/samples/{id}/species', summary: 'Recorded species linked to a sample', access: 'readSamples', params: IdParam, answer: { description: 'The linked species' } },
  { method: 'GET', path: '/api/samples/{id}/custody', summary: 'Where a sample is, who has it, and its custody events', access: 'readSamples', params: IdParam, answer: { description: 'Custody state and events' } },
  { method: 'POST', path: '/api/samples/{id}/custody', summary: 'Move, check out, check in, consume or note the condition of a sample', access: 'custody', params: IdParam, body: CustodyBody, answer: { status: 201, description: 'The custody event' }, errors: LOCK },
  { method: 'POST', path: '/api/samples/{id}/datasheets', summary: 'Attach a datasheet (PDF or image)', access: 'manageSamples', params: IdParam, body: { type: 'multipart/form-data', description: 'One part named `file`: a PDF, PNG or JPEG' }, answer: { status: 201, description: 'The stored datasheet' }, errors: { 413: 'The file is too large', 415: 'Not a PDF, PNG or JPEG' } },
  { method: 'POST', path: '/api/samples/import', summary: 'Import samples from CSV (all or nothing)', description: '`dryRun=true` checks the file and changes nothing.', access: 'manageSamples', query: ImportQuery, body: { type: 'text/csv', description: 'A header row of the CSV columns, then one sample per line' }, answer: { description: 'Rows imported (or that would be), or every problem by line and column' }, errors: { 413: 'The file is too large' } },
  { method: 'GET', path: '/api/datasheets/{id}/download', summary: 'Download a datasheet', access: 'readSamples', params: IdParam, answer: { description: 'The file as stored', type: 'application/octet-stream' } },
  { method: 'GET', path: '/api/locations', summary: 'Storage places (rooms, cabinets, shelves)', access: 'readSamples', answer: { description: 'Every place' } },
  { method: 'POST', path: '/api/locations', summary: 'Add a storage place', access: 'manageSamples', body: LocationBody, answer: { status: 201, description: 'The place' }, errors: { 409: 'A place with this code exists' } },
])
