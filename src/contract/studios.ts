// A teacher's studios, a student's memberships, and the invitations that bring students in.
import { z } from 'zod'

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
  /** The teacher sees practice from this instant on; null: all of it. */
  sharesFrom: string | null
}

/**
 * What earlier practice a new studio's teacher may see: from joining on (the default for a student
 * already in another studio), the last 30 days, or everything (the default for a first studio).
 */
export const SHARE_HISTORY_CHOICES = ['from-now', 'last-30-days', 'everything'] as const
export type ShareHistoryChoice = (typeof SHARE_HISTORY_CHOICES)[number]
export const ShareHistorySchema = z.enum(
  SHARE_HISTORY_CHOICES,
  'Choose what earlier practice to share.',
)
export const SHARE_HISTORY_LABELS: Record<ShareHistoryChoice, string> = {
  'from-now': 'From now on',
  'last-30-days': 'The last 30 days',
  everything: 'Everything',
}

export const INVITATION_STATUSES = ['pending', 'expired', 'accepted', 'revoked'] as const
export type InvitationStatus = (typeof INVITATION_STATUSES)[number]

export interface Invitation {
  id: string
  studioId: string
  studioName: string
  email: string
  /** The teacher's personal note in the e-mail, if any. */
  message: string | null
  status: InvitationStatus
  expiresAt: string
  sentAt: string
  sendCount: number
  acceptedAt: string | null
  createdAt: string
}

export const INVITE_MESSAGE_MAX = 1000
export const INVITE_BATCH_MAX = 20

/** What became of each address of a batch: invited, sent a new link, or already a member. */
export interface InvitationBatchResult {
  email: string
  outcome: 'sent' | 'resent' | 'member'
  invitation: Invitation | null
}

/** An open link for a studio: anyone with it may join, up to `maxUses` times until `expiresAt`. */
export interface InviteLink {
  id: string
  studioId: string
  studioName: string
  maxUses: number
  uses: number
  status: 'open' | 'used-up' | 'expired' | 'revoked'
  expiresAt: string
  createdAt: string
}

export const InviteLinkCreateSchema = z.object({
  maxUses: z
    .number('Give a number of uses.')
    .int('Give a whole number.')
    .min(1, 'At least one use.')
    .max(500, 'At most 500 uses.')
    .default(30),
  days: z
    .number('Give a number of days.')
    .int('Give whole days.')
    .min(1, 'At least one day.')
    .max(30, 'At most 30 days.')
    .default(14),
})
export type InviteLinkCreateInput = z.input<typeof InviteLinkCreateSchema>

/** What the acceptance page shows before the student decides. */
export interface InvitationPreview {
  studioName: string
  teacherName: string
  /** The invited address; null for an open link (any student may join with it). */
  email: string | null
  expiresAt: string
  accountExists: boolean
}
