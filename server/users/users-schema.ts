// User input schemas (e-mail, password, name, role changes); roles and the public user shape come
// from the contract and are re-exported for the server's own modules.
import { z } from 'zod'
import { RoleSchema } from '../../src/contract/users'

export {
  ROLES,
  RoleSchema,
  UserChangeSchema,
  type AdminUser,
  type PublicUser,
  type Role,
  type UserChange,
} from '../../src/contract/users'

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

export const UserIdParamsSchema = z.object({ id: z.uuid('Not a valid user id.') })

export const UserListQuerySchema = z.object({
  search: z.string().trim().max(100).optional(),
  role: RoleSchema.optional(),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
})
export type UserListQuery = z.infer<typeof UserListQuerySchema>
