// /api/admin: user list, roles and disabling, the captured-mail log (links hidden). Admins only.
import { Router } from 'express'
import { requireAuth, requireRole } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { notFound } from '../lib/errors'
import { parse, parseRequest } from '../lib/validate'
import { listUsers } from '../users/users-repository'
import { UserChangeSchema, UserIdParamsSchema, UserListQuerySchema } from '../users/users-schema'
import { MailIdParamsSchema, MailListQuerySchema } from './admin-schema'
import { changeUser } from './admin-users-service'
import { maskMessage } from './mail-mask'
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
      body: UserChangeSchema,
    })
    res.json({ user: await changeUser(ctx, req.user!.id, params.id, body) })
  })

  router.get('/mail', async (req, res) => {
    res.json(await listMail(ctx.db, parse(MailListQuerySchema, req, 'query')))
  })

  router.get('/mail/:id', async (req, res) => {
    const message = await findMail(ctx.db, parse(MailIdParamsSchema, req, 'params').id)
    if (!message) throw notFound('That message')
    res.json({ message: maskMessage(message) })
  })
  return router
}
