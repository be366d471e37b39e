// /api/studio and /api/invitations endpoints: studios, invitations, the roster and student pages.
import type { Invitation, InvitationPreview, Membership, Studio } from '../contract/studios'
import type {
  RosterPage,
  RosterRow,
  RosterSortKey,
  RosterStatus,
  StudioStudent,
} from '../contract/roster'
import type { Assignment } from '../contract/assignments'
import type { PublicUser } from '../contract/users'
import { http } from './http'

export type {
  Invitation,
  InvitationPreview,
  Membership,
  RosterPage,
  RosterRow,
  RosterSortKey,
  RosterStatus,
  Studio,
  StudioStudent,
}

export interface RosterFilters {
  search?: string
  studio?: string
  status?: RosterStatus
  sortBy?: RosterSortKey
  sortDesc?: boolean
}
export type RosterQuery = RosterFilters & { page?: number; pageSize?: number }

export const listStudents = () => http.get<{ students: StudioStudent[] }>('/studio/students')

export const listStudios = () => http.get<{ studios: Studio[] }>('/studio/studios')
export const createStudio = (name: string) =>
  http.post<{ studio: Studio }>('/studio/studios', { name })
export const renameStudio = (id: string, name: string) =>
  http.patch<{ studio: Studio }>(`/studio/studios/${id}`, { name })
export const deleteStudio = (id: string) => http.delete<void>(`/studio/studios/${id}`)
export const removeStudent = (studioId: string, studentId: string) =>
  http.delete<void>(`/studio/studios/${studioId}/students/${studentId}`)

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

export const fetchRoster = (query: RosterQuery) =>
  http.get<RosterPage>('/studio/roster', { query: { ...query } })
export const fetchStudent = (id: string) =>
  http.get<{ student: RosterRow }>(`/studio/students/${id}`)
export const fetchStudentAssignments = (id: string) =>
  http.get<{ assignments: Assignment[] }>(`/studio/students/${id}/assignments`)

function queryString(query: Record<string, string | number | boolean | undefined>) {
  const params = new URLSearchParams()
  for (const [k, v] of Object.entries(query))
    if (v !== undefined && v !== '') params.set(k, String(v))
  const qs = params.toString()
  return qs ? `?${qs}` : ''
}

/** Download links (plain same-origin links carry the session cookie). */
export const rosterCsvUrl = (filters: RosterFilters) =>
  `/api/studio/roster.csv${queryString({ ...filters })}`
export const resultsCsvUrl = (studentId: string) => `/api/studio/students/${studentId}/results.csv`

export const listMemberships = () => http.get<{ memberships: Membership[] }>('/studio/memberships')
export const leaveStudio = (studioId: string) =>
  http.delete<void>(`/studio/memberships/${studioId}`)

export const previewInvitation = (token: string) =>
  http.get<{ invitation: InvitationPreview }>('/invitations/preview', {
    query: { token },
    quiet401: true,
  })
export const acceptInvitation = (body: { token: string; name?: string; password?: string }) =>
  http.post<{ user: PublicUser; studio: { id: string; name: string }; alreadyMember: boolean }>(
    '/invitations/accept',
    body,
    {
      quiet401: true,
    },
  )
