// Studio shapes shared by the API and the client: studios, members, invitations and the roster.
import { z } from 'zod'
import { EmailSchema, NameSchema, PasswordSchema } from '../users/users-schema'

/** GET /api/studio/students: one row per studio membership (a contract used by outside checks). */
export interface StudioStudent {
  id: string
  name: string
  email: string
  studioId: string
  studioName: string
  joinedAt: string
  lastPracticeAt: string | null
  accuracy: number | null
}

export interface Studio {
  id: string
  name: string
  createdAt: string
  studentCount: number
  pendingInvitations: number
}

/** A studio the signed-in student belongs to. */
export interface Membership {
  studioId: string
  studioName: string
  teacherName: string
  joinedAt: string
}

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

export const INVITATION_STATUSES = ['pending', 'expired', 'accepted', 'revoked'] as const
export type InvitationStatus = (typeof INVITATION_STATUSES)[number]

export interface Invitation {
  id: string
  studioId: string
  studioName: string
  email: string
  status: InvitationStatus
  expiresAt: string
  sentAt: string
  sendCount: number
  acceptedAt: string | null
  createdAt: string
}

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

/** What the acceptance page shows before the student decides. */
export interface InvitationPreview {
  studioName: string
  teacherName: string
  email: string
  expiresAt: string
  accountExists: boolean
}

// ---- roster ---------------------------------------------------------------------------------

export const ROSTER_STATUSES = ['behind', 'on-track', 'inactive'] as const
export type RosterStatus = (typeof ROSTER_STATUSES)[number]

export const ROSTER_SORT_KEYS = [
  'name',
  'email',
  'lastPracticeAt',
  'minutesThisWeek',
  'accuracy',
  'recallTrend',
  'planCompletion',
  'status',
] as const
export type RosterSortKey = (typeof ROSTER_SORT_KEYS)[number]

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

export interface WeakSpot {
  string: number
  fret: number
  /** e.g. "A string, fret 7 (E2)" */
  label: string
  accuracy: number
  attempts: number
}

export interface RecallTrend {
  /** Median response of correct answers in the last 7 days, and in the 7 days before. */
  medianMs: number | null
  previousMedianMs: number | null
  /** this week's median / last week's − 1: negative when recall got faster (−0.1 = 10 % faster). */
  change: number | null
  direction: 'faster' | 'slower' | 'steady' | null
}

export interface RosterRow {
  id: string
  name: string
  email: string
  studios: { id: string; name: string }[]
  lastPracticeAt: string | null
  minutesThisWeek: number
  attemptsThisWeek: number
  /** Share of correct answers over the last 7 days. */
  accuracy: number | null
  recall: RecallTrend
  plans: {
    assigned: number
    complete: number
    overdue: number
    targetsMet: number
    targetsTotal: number
  }
  /** targetsMet / targetsTotal over assigned plans; null with none assigned. */
  planCompletion: number | null
  weakSpots: WeakSpot[]
  status: RosterStatus
}

export interface RosterPage {
  total: number
  items: RosterRow[]
}
