// Who a user is to the other side: the three roles and a user as the API returns it.
import { z } from 'zod'

export const ROLES = ['student', 'teacher', 'admin'] as const
export const RoleSchema = z.enum(ROLES)
export type Role = z.infer<typeof RoleSchema>

/** A user as the API returns it (never the password hash). */
export interface PublicUser {
  id: string
  email: string
  name: string
  role: Role
  createdAt: string
}
