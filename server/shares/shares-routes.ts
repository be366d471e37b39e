// /api/shares: make, list and revoke links to exercises (signed in); read one by its token (anyone).
import { Router } from 'express'
import { requireAuth } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { parse } from '../lib/validate'
import { ShareCreateSchema } from '../../src/contract/shares'
import { ShareParamsSchema } from './shares-schema'
import { createShare, listMyShares, readShare, revokeMyShare } from './shares-service'

export function shareRoutes(ctx: AppContext): Router {
  const router = Router()
  const signedIn = requireAuth(ctx)

  router.post('/', signedIn, async (req, res) => {
    const body = parse(ShareCreateSchema, req)
    res.status(201).json({ share: await createShare(ctx, req.user!, body) })
  })

  router.get('/', signedIn, async (req, res) => {
    res.json({ shares: await listMyShares(ctx, req.user!) })
  })

  // No account needed: the token is the permission. Never cached, so a revoke takes effect at once.
  router.get('/:token', async (req, res) => {
    const { token } = parse(ShareParamsSchema, req, 'params')
    res.set('Cache-Control', 'no-store').json({ share: await readShare(ctx, token) })
  })

  router.delete('/:token', signedIn, async (req, res) => {
    const { token } = parse(ShareParamsSchema, req, 'params')
    await revokeMyShare(ctx, req.user!, token)
    res.status(204).end()
  })
  return router
}
