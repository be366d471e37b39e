// /api/admin endpoints.
import type { MailMessage, MailSummary } from '../contract/mail-log'
import type { PublicUser, Role } from '../contract/users'
import { http } from './http'

export type { MailMessage, MailSummary }

export interface Page<T> {
  total: number
  items: T[]
}

export interface PageQuery {
  search?: string
  page?: number
  pageSize?: number
  [key: string]: string | number | undefined
}

export const listUsers = (query: PageQuery & { role?: Role }) =>
  http.get<Page<PublicUser>>('/admin/users', { query })
export const changeRole = (id: string, role: Role) =>
  http.patch<{ user: PublicUser }>(`/admin/users/${id}`, { role })
export const listMail = (query: PageQuery) => http.get<Page<MailSummary>>('/admin/mail', { query })
export const fetchMail = (id: number) => http.get<{ message: MailMessage }>(`/admin/mail/${id}`)
export const sendDigestsNow = () => http.post<{ sent: number }>('/admin/digests/send')
