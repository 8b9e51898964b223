import { AuditQuery } from '../../schemas/audit'
import { routes } from '../types'

export default routes([
  { method: 'GET', path: '/api/health', summary: 'Liveness: database, object store and mail reachable', access: 'public', answer: { description: 'ok, or which service is down (503)' }, errors: { 503: 'A service is down' } },
  { method: 'GET', path: '/api/overview', summary: 'The overview page\'s figures', access: 'signed-in', answer: { description: 'Counts and recent activity' } },
  { method: 'GET', path: '/api/audit', summary: 'The audit trail', description: '`format=csv` answers the whole filtered trail as CSV.', access: 'readAudit', query: AuditQuery, answer: { description: 'A page of audit rows (or CSV)' } },
  { method: 'POST', path: '/api/notices/run', summary: 'Send the daily notices now', access: 'runNotices', answer: { description: 'How many notices of each kind went out' } },
  { method: 'GET', path: '/api/jobs', summary: 'Background jobs: waiting, running, done, failed (with errors), and the SCF precompute\'s progress', access: 'viewJobs', answer: { description: 'Per queue counts, latest failures, precompute progress' } },
  { method: 'GET', path: '/api/openapi.json', summary: 'This description (OpenAPI 3.1)', access: 'public', answer: { description: 'The OpenAPI document' } },
])
