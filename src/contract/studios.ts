// A teacher's studios, a student's memberships, and the invitations that bring students in.

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

/** What the acceptance page shows before the student decides. */
export interface InvitationPreview {
  studioName: string
  teacherName: string
  email: string
  expiresAt: string
  accountExists: boolean
}
