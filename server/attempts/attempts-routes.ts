// /api/attempts: graded answers in batches; the player is always the signed-in user.
import { Router } from 'express'
import { requireAuth } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { parse } from '../lib/validate'
import { AttemptBatchSchema } from '../../src/contract/attempts'
import { recordAttempts } from './attempts-service'

export function attemptsRoutes(ctx: AppContext): Router {
  const router = Router()
  router.use(requireAuth(ctx))

  // 201 when something new was stored, 200 when every attempt was already there.
  router.post('/', async (req, res) => {
    const result = await recordAttempts(ctx, req.user!, parse(AttemptBatchSchema, req))
    res.status(result.stored > 0 ? 201 : 200).json(result)
  })
  return router
}
