import { z } from 'zod'
import { ROLES } from '../auth/roles'

/** At least this many characters for a password (long passphrases beat composition rules). */
export const PASSWORD_MIN_LENGTH = 12

export const Email = z.string().trim().toLowerCase().max(254).pipe(z.email({ message: 'Enter a valid e-mail address' }))

export const SignInBody = z.object({
  email: Email,
  password: z.string().min(1, 'Enter your password').max(1024),
})

export const Password = z
  .string()
  .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters`)
  .max(1024, 'Use at most 1024 characters')

/** What is wrong with a new password typed twice in a form (the rule and the repeat), or null. */
export function newPasswordProblem(password: string, repeated: string): string | null {
  const parsed = Password.safeParse(password)
  if (!parsed.success) return parsed.error.issues[0]!.message
  return password === repeated ? null : 'The two passwords differ'
}

export const RoleSchema = z.enum(ROLES, { message: `Role must be one of: ${ROLES.join(', ')}` })

export const InviteBody = z.object({
  email: Email,
  name: z.string().trim().min(1, 'Enter a name').max(120),
  role: RoleSchema,
})

/** GET /api/auth/invitation?token=… (an invitation's token, not an API token). */
export const InvitationQuery = z.object({ token: z.string().min(20).max(200) })

export const AcceptInvitationBody = z.object({
  token: z.string().min(20).max(200),
  password: Password,
})

export const UpdateUserBody = z
  .object({
    role: RoleSchema.optional(),
    active: z.boolean().optional(),
  })
  .refine((b) => b.role !== undefined || b.active !== undefined, { message: 'Give a role or an active flag to change' })

export type SignInInput = z.infer<typeof SignInBody>
export type InviteInput = z.infer<typeof InviteBody>

export const ChangePasswordBody = z.object({
  currentPassword: z.string().min(1, 'Enter your current password').max(1024),
  newPassword: Password,
})

export const ResetRequestBody = z.object({ email: Email })

const RESET_LINK_INVALID = 'This link is not valid or was already used; ask for a new one'

export const ResetCompleteBody = z.object({
  token: z.string({ error: RESET_LINK_INVALID }).min(20, RESET_LINK_INVALID).max(200, RESET_LINK_INVALID),
  password: Password,
})

/** Inviting again: `resend` sends a fresh link to someone already invited (the old link stops working). */
export const InviteAgainBody = InviteBody.extend({ resend: z.boolean().optional() })
