// Request bodies of the sign-in routes.
import { z } from 'zod'
import { EmailSchema, NameSchema, PasswordSchema } from '../users/users-schema'

export const RegisterSchema = z.object({
  email: EmailSchema,
  password: PasswordSchema,
  name: NameSchema,
  role: z.enum(['student', 'teacher'], 'Choose student or teacher.'),
})
export type RegisterInput = z.infer<typeof RegisterSchema>

export const LoginSchema = z.object({
  email: EmailSchema,
  password: z.string().min(1, 'Enter your password.').max(200),
})
export type LoginInput = z.infer<typeof LoginSchema>

export const ChangePasswordSchema = z.object({
  currentPassword: z.string().min(1, 'Enter your current password.').max(200),
  newPassword: PasswordSchema,
})

export const ResetRequestSchema = z.object({ email: EmailSchema })

export const ResetConfirmSchema = z.object({
  token: z.string().min(20, 'This reset link is incomplete.').max(200),
  password: PasswordSchema,
})
