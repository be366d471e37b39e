// Invitations: a teacher's (/api/studio/…/invitations) and the public link (/api/invitations).
import type {
  Invitation,
  InvitationBatchResult,
  InvitationPreview,
  InviteLink,
  InviteLinkCreateInput,
  ShareHistoryChoice,
} from '../contract/studios'
import type { PublicUser } from '../contract/users'
import { http } from './http'

export type { Invitation, InvitationPreview, InviteLink, ShareHistoryChoice }

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
/** A new open link; its address (`url`) is answered only now. */
export const createInviteLink = (studioId: string, input: InviteLinkCreateInput) =>
  http.post<{ link: InviteLink; url: string }>(`/studio/studios/${studioId}/invite-links`, input)
export const listInviteLinks = () => http.get<{ links: InviteLink[] }>('/studio/invite-links')
export const revokeInviteLink = (id: string) =>
  http.delete<{ link: InviteLink }>(`/studio/invite-links/${id}`)
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
export const acceptInvitation = (body: {
  token: string
  name?: string
  password?: string
  email?: string
  shareHistory?: ShareHistoryChoice
}) =>
  http.post<{
    user: PublicUser
    studio: { id: string; name: string; sharesFrom: string | null }
    alreadyMember: boolean
  }>('/invitations/accept', body, { quiet401: true })
