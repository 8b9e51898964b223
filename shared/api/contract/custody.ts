import { IdParam } from '../../schemas/common'
import { CheckoutListQuery, HolderSearchQuery } from '../../schemas/custody'
import { WithdrawDatasheetBody } from '../../schemas/datasheets'
import { routes } from '../types'

export default routes([
  { method: 'GET', path: '/api/checkouts', summary: 'Samples checked out: mine, overdue, or every open check-out', access: 'custody', query: CheckoutListQuery, answer: { description: 'The check-outs with holder and due day' } },
  { method: 'GET', path: '/api/custody/people', summary: 'Active lab members a sample can be checked out to (names and roles only)', access: 'custody', query: HolderSearchQuery, answer: { description: 'Matching people' } },
  { method: 'POST', path: '/api/datasheets/{id}/replace', summary: 'Upload a new version of a datasheet (multipart); the old one is kept and listed', access: 'manageSamples', params: IdParam, answer: { description: 'The new version' }, errors: { 409: 'Replaced or withdrawn meanwhile, or the sample is retired', 413: 'File too large' } },
  { method: 'POST', path: '/api/datasheets/{id}/withdraw', summary: 'Withdraw a datasheet: hidden, kept and audited; refused while a certificate lists it', access: 'manageSamples', params: IdParam, body: WithdrawDatasheetBody, answer: { description: 'The withdrawn datasheet' }, errors: { 409: 'Listed by a certificate in force' } },
])
