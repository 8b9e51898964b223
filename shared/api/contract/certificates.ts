import { CertificateListQuery, CertificateZipQuery, IssueCertificateBody, RevokeBody, SupersedeBody, VerifyParams, VerifyQuery } from '../../schemas/certificates'
import { IdParam } from '../../schemas/common'
import { LabelsBody } from '../../schemas/labels'
import { routes } from '../types'

export default routes([
  { method: 'GET', path: '/api/certificates', summary: 'List certificates (filter by status, subject, dates)', access: 'readCertificates', query: CertificateListQuery, answer: { description: 'A page of certificates' } },
  { method: 'POST', path: '/api/certificates', summary: 'Issue a certificate for a sample or a recorded species', access: 'issueCertificates', body: IssueCertificateBody, answer: { status: 201, description: 'The certificate with its number and SHA-256 digest' }, errors: { 409: 'The subject is not certifiable as it stands' } },
  { method: 'GET', path: '/api/certificates/{id}', summary: 'One certificate', access: 'readCertificates', params: IdParam, answer: { description: 'The certificate and its frozen payload' } },
  { method: 'GET', path: '/api/certificates/{id}/pdf', summary: 'Download a certificate as PDF', access: 'readCertificates', params: IdParam, answer: { description: 'The PDF', type: 'application/pdf' } },
  { method: 'POST', path: '/api/certificates/{id}/supersede', summary: 'Issue a corrected version that supersedes this one', access: 'issueCertificates', params: IdParam, body: SupersedeBody, answer: { status: 201, description: 'The new version' }, errors: { 409: 'Only a current certificate can be superseded' } },
  { method: 'POST', path: '/api/certificates/{id}/revoke', summary: 'Revoke a certificate', access: 'issueCertificates', params: IdParam, body: RevokeBody, answer: { description: 'The revoked certificate' }, errors: { 409: 'Already revoked or superseded' } },
  { method: 'GET', path: '/api/certificates/zip', summary: 'Every certificate PDF of a period, zipped', access: 'readCertificates', query: CertificateZipQuery, answer: { description: 'A ZIP of PDFs', type: 'application/zip' } },
  { method: 'GET', path: '/api/public/verify/{number}', summary: 'Check a certificate by number and digest (no sign-in)', access: 'public', params: VerifyParams, query: VerifyQuery, answer: { description: 'genuine, superseded, revoked or unknown' }, errors: { 429: 'Too many checks from this address' } },
  { method: 'POST', path: '/api/labels', summary: 'A sheet of QR labels for samples, as PDF', access: 'printLabels', body: LabelsBody, answer: { description: 'The label sheet', type: 'application/pdf' } },
])
