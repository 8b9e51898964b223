import { AcceptInvitationBody, ChangePasswordBody, InvitationQuery, InviteBody, ResetCompleteBody, ResetRequestBody, SignInBody, UpdateUserBody } from '../../schemas/auth'
import { IdParam, ListQuery } from '../../schemas/common'
import { routes } from '../types'

export default routes([
  { method: 'POST', path: '/api/auth/sign-in', summary: 'Sign in (sets the session cookie)', access: 'public', body: SignInBody, answer: { description: 'The signed-in person' }, errors: { 401: 'Wrong e-mail or password', 429: 'Too many failed sign-ins' } },
  { method: 'POST', path: '/api/auth/sign-out', summary: 'Sign out (ends the session everywhere)', access: 'public', answer: { description: 'Signed out' } },
  { method: 'GET', path: '/api/auth/me', summary: 'Who is calling', access: 'signed-in', answer: { description: 'id, email, name and role of the caller' } },
  { method: 'GET', path: '/api/auth/invitation', summary: 'An open invitation by its token', access: 'public', query: InvitationQuery, answer: { description: 'Name, e-mail and role invited' }, errors: { 404: 'No open invitation with this token', 410: 'The invitation has expired' } },
  { method: 'POST', path: '/api/auth/accept-invitation', summary: 'Accept an invitation and set a password', access: 'public', body: AcceptInvitationBody, answer: { description: 'The new person, signed in' }, errors: { 404: 'No open invitation with this token', 410: 'The invitation has expired' } },
  { method: 'POST', path: '/api/auth/password', summary: 'Change your password (ends your other sessions)', access: 'signed-in', body: ChangePasswordBody, answer: { description: 'How many other sessions ended' } },
  { method: 'POST', path: '/api/auth/password-reset', summary: 'Ask for a password-reset link by e-mail', description: 'Answers the same whether or not the address is known.', access: 'public', body: ResetRequestBody, answer: { status: 202, description: 'Accepted' }, errors: { 429: 'Too many requests' } },
  { method: 'POST', path: '/api/auth/password-reset/complete', summary: 'Set a new password with a reset link\'s token', access: 'public', body: ResetCompleteBody, answer: { description: 'The person, signed in' }, errors: { 404: 'The link is not valid or was already used', 410: 'The link has expired' } },
  { method: 'POST', path: '/api/users/{id}/reset-password', summary: 'Send someone a password-reset link', access: 'managePeople', params: IdParam, answer: { description: 'Sent' } },
  { method: 'GET', path: '/api/users', summary: 'People and open invitations', access: 'managePeople', query: ListQuery, answer: { description: 'A page of people, and the invitations waiting' } },
  { method: 'POST', path: '/api/users', summary: 'Invite someone (sends an e-mail)', access: 'managePeople', body: InviteBody, answer: { status: 201, description: 'The invitation' }, errors: { 409: 'Someone with this e-mail exists' } },
  { method: 'PATCH', path: '/api/users/{id}', summary: 'Change a role, deactivate or reactivate', description: 'Deactivation ends the person\'s sessions and API tokens at once.', access: 'managePeople', params: IdParam, body: UpdateUserBody, answer: { description: 'The person' } },
])
