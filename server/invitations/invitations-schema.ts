// Invitation inputs: the address to invite, the list's filter, and the token of the public link.
import { z } from 'zod'
import { EmailSchema, NameSchema, PasswordSchema } from '../users/users-schema'

export const InvitationInputSchema = z.object({ email: EmailSchema })
export const InvitationIdParamsSchema = z.object({ id: z.uuid('Not a valid invitation id.') })
export const InvitationListQuerySchema = z.object({
  studio: z.uuid('Not a valid studio id.').optional(),
  /** open = pending or expired (the ones a teacher can still act on); all = every invitation. */
  status: z.enum(['open', 'all']).default('open'),
})

const TokenSchema = z.string().min(20, 'This invitation link is incomplete.').max(200)
export const InvitationTokenQuerySchema = z.object({ token: TokenSchema })

/** Accepting: signed in already, or new account fields (the e-mail is the invited one). */
export const AcceptInvitationSchema = z.object({
  token: TokenSchema,
  name: NameSchema.optional(),
  password: PasswordSchema.optional(),
})
export type AcceptInvitationInput = z.infer<typeof AcceptInvitationSchema>
