// /api/auth endpoints.
import type { PublicUser } from '../contract/users'
import { http } from './http'

export type { PublicUser }

export interface RegisterBody {
  email: string
  password: string
  name: string
  role: 'student' | 'teacher'
}

export const fetchMe = () => http.get<{ user: PublicUser }>('/auth/me', { quiet401: true })
export const login = (email: string, password: string) =>
  http.post<{ user: PublicUser }>('/auth/login', { email, password }, { quiet401: true })
export const register = (body: RegisterBody) =>
  http.post<{ user: PublicUser }>('/auth/register', body)
export const logout = () => http.post<void>('/auth/logout')
/** Ends every session of the signed-in user, on every device (this one too). */
export const logoutEverywhere = () => http.post<void>('/auth/logout-everywhere')
export const changePassword = (currentPassword: string, newPassword: string) =>
  http.post<void>('/auth/password', { currentPassword, newPassword })
export const requestPasswordReset = (email: string) =>
  http.post<{ message: string }>('/auth/password-reset', { email })
export const confirmPasswordReset = (token: string, password: string) =>
  http.post<void>('/auth/password-reset/confirm', { token, password })
