// /api/health: liveness plus a database round trip.
import { Router } from 'express'
import type { AppContext } from '../context'

export function healthRoutes(ctx: AppContext): Router {
  const router = Router()
  router.get('/', async (_req, res) => {
    const started = Date.now()
    try {
      await ctx.db.raw('select 1')
      res.json({ status: 'ok', database: { status: 'ok', latencyMs: Date.now() - started } })
    } catch {
      res.status(503).json({ status: 'degraded', database: { status: 'unreachable' } })
    }
  })
  return router
}
