// Studio route inputs: studios, invitations and the roster's queries (answers: src/contract).
import { z } from 'zod'
import { ROSTER_SORT_KEYS, ROSTER_STATUSES } from '../../src/contract/roster'
import { EmailSchema, NameSchema, PasswordSchema } from '../users/users-schema'

export const StudioInputSchema = z.object({
  name: z.string().trim().min(1, 'Give the studio a name.').max(80, 'Use at most 80 characters.'),
})

export const StudioIdParamsSchema = z.object({ id: z.uuid('Not a valid studio id.') })
export const StudentIdParamsSchema = z.object({ id: z.uuid('Not a valid student id.') })
export const StudioStudentParamsSchema = z.object({
  id: z.uuid('Not a valid studio id.'),
  studentId: z.uuid('Not a valid student id.'),
})

// ---- invitations ----------------------------------------------------------------------------

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

// ---- roster ---------------------------------------------------------------------------------

const RosterFilterFields = {
  search: z.string().trim().max(100, 'Use at most 100 characters.').optional(),
  studio: z.uuid('Not a valid studio id.').optional(),
  status: z.enum(ROSTER_STATUSES, 'Choose behind, on-track or inactive.').optional(),
  sortBy: z.enum(ROSTER_SORT_KEYS, 'Not a column the roster sorts by.').default('name'),
  sortDesc: z.stringbool({ error: 'Use true or false.' }).default(false),
}

export const RosterQuerySchema = z.object({
  ...RosterFilterFields,
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
})
export type RosterQuery = z.infer<typeof RosterQuerySchema>

export const RosterExportQuerySchema = z.object(RosterFilterFields)
export type RosterFilter = z.infer<typeof RosterExportQuerySchema>

export const ResultsExportQuerySchema = z.object({
  from: z.iso.date('Use a date like 2026-01-31.').optional(),
  to: z.iso.date('Use a date like 2026-01-31.').optional(),
})
