// Invitations: a teacher's (/api/studio/…/invitations) and the public link (/api/invitations).
import type { Invitation, InvitationBatchResult, InvitationPreview } from '../contract/studios'
import type { PublicUser } from '../contract/users'
import { http } from './http'

export type { Invitation, InvitationPreview }

export const invite = (studioId: string, email: string, message?: string) =>
  http.post<{ invitation: Invitation; resent: boolean }>(
    `/studio/studios/${studioId}/invitations`,
    { email, ...(message ? { message } : {}) },
  )
/** Several addresses at once, one note for all. */
export const inviteMany = (studioId: string, emails: string[], message?: string) =>
  http.post<{ results: InvitationBatchResult[] }>(`/studio/studios/${studioId}/invitations/batch`, {
    emails,
    ...(message ? { message } : {}),
  })
export const listInvitations = () => http.get<{ invitations: Invitation[] }>('/studio/invitations')
export const resendInvitation = (id: string) =>
  http.post<{ invitation: Invitation }>(`/studio/invitations/${id}/resend`)
export const revokeInvitation = (id: string) =>
  http.delete<{ invitation: Invitation }>(`/studio/invitations/${id}`)

export const previewInvitation = (token: string) =>
  http.get<{ invitation: InvitationPreview }>('/invitations/preview', {
    query: { token },
    quiet401: true,
  })
export const acceptInvitation = (body: { token: string; name?: string; password?: string }) =>
  http.post<{ user: PublicUser; studio: { id: string; name: string }; alreadyMember: boolean }>(
    '/invitations/accept',
    body,
    { quiet401: true },
  )
