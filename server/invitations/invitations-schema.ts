// Invitation inputs: the address to invite, the list's filter, and the token of the public link.
import { z } from 'zod'
import { EmailSchema, NameSchema, PasswordSchema } from '../users/users-schema'
import {
  INVITE_BATCH_MAX,
  INVITE_MESSAGE_MAX,
  ShareHistorySchema,
} from '../../src/contract/studios'

const NoteSchema = z
  .string('Write the note as text.')
  .trim()
  .max(INVITE_MESSAGE_MAX, `Use at most ${INVITE_MESSAGE_MAX.toLocaleString('en')} characters.`)
  .transform((note) => note || undefined)
  .optional()

export const InvitationInputSchema = z.object({ email: EmailSchema, message: NoteSchema })
/** Several addresses at once (each once), with one note for all. */
export const InvitationBatchSchema = z.object({
  emails: z
    .array(EmailSchema, 'List the e-mail addresses.')
    .min(1, 'Give at least one e-mail address.')
    .max(INVITE_BATCH_MAX, `At most ${INVITE_BATCH_MAX} addresses at once.`),
  message: NoteSchema,
})
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
  /** Only for an open link's new account (an e-mail invitation uses the invited address). */
  email: EmailSchema.optional(),
  name: NameSchema.optional(),
  password: PasswordSchema.optional(),
  /** A signed-in student's choice of earlier practice the new teacher may see. */
  shareHistory: ShareHistorySchema.optional(),
})
export type AcceptInvitationInput = z.infer<typeof AcceptInvitationSchema>
