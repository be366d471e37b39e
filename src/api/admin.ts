// /api/admin endpoints.
import type { MailMessage, MailSummary } from '../contract/mail-log'
import type { AdminUser, Role, UserChange } from '../contract/users'
import { http } from './http'

export type { AdminUser, MailMessage, MailSummary, UserChange }

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
  http.get<Page<AdminUser>>('/admin/users', { query })
/** Changes an account's role or disables / enables it; the account's sessions end either way. */
export const changeUser = (id: string, change: UserChange) =>
  http.patch<{ user: AdminUser }>(`/admin/users/${id}`, change)
export const listMail = (query: PageQuery) => http.get<Page<MailSummary>>('/admin/mail', { query })
export const fetchMail = (id: number) => http.get<{ message: MailMessage }>(`/admin/mail/${id}`)
export const sendDigestsNow = () => http.post<{ sent: number }>('/admin/digests/send')
