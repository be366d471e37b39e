// /api/admin: user list and roles, the captured-mail log. Admins only.
import { Router } from 'express'
import { requireAuth, requireRole } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { badRequest, notFound } from '../lib/errors'
import { parse, parseRequest } from '../lib/validate'
import { listUsers, toPublicUser, updateRole } from '../users/users-repository'
import { RoleChangeSchema, UserIdParamsSchema, UserListQuerySchema } from '../users/users-schema'
import { MailIdParamsSchema, MailListQuerySchema } from './admin-schema'
import { findMail, listMail } from './mail-log-repository'

export function adminRoutes(ctx: AppContext): Router {
  const router = Router()
  router.use(requireAuth(ctx), requireRole('admin'))

  router.get('/users', async (req, res) => {
    res.json(await listUsers(ctx.db, parse(UserListQuerySchema, req, 'query')))
  })

  router.patch('/users/:id', async (req, res) => {
    const { params, body } = parseRequest(req, {
      params: UserIdParamsSchema,
      body: RoleChangeSchema,
    })
    if (params.id === req.user!.id)
      throw badRequest('You cannot change your own role.', { role: ['Ask another admin.'] })
    const user = await updateRole(ctx.db, params.id, body.role)
    if (!user) throw notFound('That user')
    res.json({ user: toPublicUser(user) })
  })

  router.get('/mail', async (req, res) => {
    res.json(await listMail(ctx.db, parse(MailListQuerySchema, req, 'query')))
  })

  router.get('/mail/:id', async (req, res) => {
    const message = await findMail(ctx.db, parse(MailIdParamsSchema, req, 'params').id)
    if (!message) throw notFound('That message')
    res.json({ message })
  })
  return router
}
