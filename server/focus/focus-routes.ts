// /api/focus: the next questions for a drill, weakest places first, each with its reason.
import { Router } from 'express'
import { requireAuth } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { parse } from '../lib/validate'
import { FocusQuerySchema } from './focus-schema'
import { focusFor } from './focus-service'

export function focusRoutes(ctx: AppContext): Router {
  const router = Router()
  router.use(requireAuth(ctx))

  router.get('/', async (req, res) => {
    res.json(await focusFor(ctx, req.user!, parse(FocusQuerySchema, req, 'query')))
  })
  return router
}
