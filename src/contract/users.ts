// Who a user is to the other side: the three roles, a user as the API returns it, an admin's change.
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

/** A user as the admin list shows it. */
export interface AdminUser extends PublicUser {
  disabledAt: string | null
}

/** An admin's change to an account: its role, and/or disabling or enabling it. */
export const UserChangeSchema = z
  .strictObject({ role: RoleSchema.optional(), disabled: z.boolean().optional() })
  .refine((c) => c.role !== undefined || c.disabled !== undefined, 'Send a role or disabled.')
export type UserChange = z.infer<typeof UserChangeSchema>
