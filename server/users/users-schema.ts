// User shapes shared by the API and the client.
import { z } from 'zod'

export const ROLES = ['student', 'teacher', 'admin'] as const
export const RoleSchema = z.enum(ROLES)
export type Role = z.infer<typeof RoleSchema>

export const EmailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .max(254, 'An e-mail address has at most 254 characters.')
  .pipe(z.email('Enter a valid e-mail address.'))

export const PasswordSchema = z
  .string()
  .min(10, 'Use at least 10 characters.')
  .max(200, 'Use at most 200 characters.')

export const NameSchema = z
  .string()
  .trim()
  .min(1, 'Enter your name.')
  .max(80, 'Use at most 80 characters.')

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

export const UserIdParamsSchema = z.object({ id: z.uuid('Not a valid user id.') })

export const UserListQuerySchema = z.object({
  search: z.string().trim().max(100).optional(),
  role: RoleSchema.optional(),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
})
export type UserListQuery = z.infer<typeof UserListQuerySchema>

/** An admin's change to an account: its role, and/or disabling or enabling it. */
export const UserChangeSchema = z
  .strictObject({ role: RoleSchema.optional(), disabled: z.boolean().optional() })
  .refine((c) => c.role !== undefined || c.disabled !== undefined, 'Send a role or disabled.')
export type UserChange = z.infer<typeof UserChangeSchema>
