import { describe, it, expect } from 'vitest'
import { PASSWORD_MIN_LENGTH, newPasswordProblem } from '../../../shared/schemas/auth'

// The one check the invitation and password-reset pages run before sending a new password.
describe('newPasswordProblem', () => {
  const good = 'x'.repeat(PASSWORD_MIN_LENGTH)
  it.each([
    ['too short', 'short', 'short', `Use at least ${PASSWORD_MIN_LENGTH} characters`],
    ['repeated differently', good, `${good}y`, 'The two passwords differ'],
    ['long enough and repeated', good, good, null],
  ])('%s', (_what, password, repeated, problem) => {
    expect(newPasswordProblem(password, repeated)).toBe(problem)
  })
})
