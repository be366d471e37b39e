// /api/studio/studios and /api/studio/memberships: a teacher's studios, a student's memberships.
import type { Membership, Studio } from '../contract/studios'
import { http } from './http'

export type { Membership, Studio }

export const listStudios = () => http.get<{ studios: Studio[] }>('/studio/studios')
export const createStudio = (name: string) =>
  http.post<{ studio: Studio }>('/studio/studios', { name })
export const renameStudio = (id: string, name: string) =>
  http.patch<{ studio: Studio }>(`/studio/studios/${id}`, { name })
export const deleteStudio = (id: string) => http.delete<void>(`/studio/studios/${id}`)
export const removeStudent = (studioId: string, studentId: string) =>
  http.delete<void>(`/studio/studios/${studioId}/students/${studentId}`)

export const listMemberships = () => http.get<{ memberships: Membership[] }>('/studio/memberships')
export const leaveStudio = (studioId: string) =>
  http.delete<void>(`/studio/memberships/${studioId}`)
