// /api/admin/digests: the admin action "send digests now".
import { Router } from 'express'
import { requireAuth, requireRole } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { mailLimit } from '../lib/rate-limits'
import { sendWeeklyDigests } from './digest-service'

export function mountDigests(api: Router, ctx: AppContext) {
  const router = Router()
  router.use(requireAuth(ctx), requireRole('admin'))
  router.post('/send', mailLimit(ctx, 'digest'), async (_req, res) => {
    res.json(await sendWeeklyDigests(ctx, new Date(), { force: true }))
  })
  api.use('/admin/digests', router)
}
