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
  status: InvitationStatus
  expiresAt: string
  sentAt: string
  sendCount: number
  acceptedAt: string | null
  createdAt: string
}

/** What the acceptance page shows before the student decides. */
export interface InvitationPreview {
  studioName: string
  teacherName: string
  email: string
  expiresAt: string
  accountExists: boolean
}
