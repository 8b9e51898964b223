import { IdParam } from '../../schemas/common'
import { InventoryQuery, LicenceLimitBody } from '../../schemas/samples'
import { routes } from '../types'

export default routes([
  { method: 'GET', path: '/api/inventory', summary: 'Radioactive sources: activity today per nuclide, per room and for the laboratory, against the licence limits', description: '`format=csv` answers the inventory as CSV.', access: 'readInventory', query: InventoryQuery, answer: { description: 'The inventory (or CSV)' } },
  { method: 'GET', path: '/api/licence-limits', summary: 'The licence limits per nuclide, for a room or the whole laboratory', access: 'readInventory', answer: { description: 'The limits' } },
  { method: 'PUT', path: '/api/licence-limits', summary: 'Set the licence limit of one nuclide in one room or the laboratory', access: 'manageLicence', body: LicenceLimitBody, answer: { description: 'The limit as stored' } },
  { method: 'DELETE', path: '/api/licence-limits/{id}', summary: 'Remove a licence limit', access: 'manageLicence', params: IdParam, answer: { description: 'Removed' } },
])
