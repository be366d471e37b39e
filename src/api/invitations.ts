// Invitations: a teacher's (/api/studio/…/invitations) and the public link (/api/invitations).
import type { Invitation, InvitationPreview } from '../contract/studios'
import type { PublicUser } from '../contract/users'
import { http } from './http'

export type { Invitation, InvitationPreview }

export const invite = (studioId: string, email: string) =>
  http.post<{ invitation: Invitation; resent: boolean }>(
    `/studio/studios/${studioId}/invitations`,
    { email },
  )
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
