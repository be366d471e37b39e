// /api/account: the signed-in user's own settings (the time zone; name and password live in auth).
import { Router } from 'express'
import { requireAuth } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { parse } from '../lib/validate'
import { BrowserTimeZoneSchema, TimeZoneChoiceSchema } from '../../src/contract/account'
import * as account from './account-service'

export function accountRoutes(ctx: AppContext): Router {
  const router = Router()
  router.use(requireAuth(ctx))
  router.get('/time-zone', async (req, res) => {
    res.json({ setting: await account.timeZoneSetting(ctx, req.user!.id) })
  })
  router.put('/time-zone', async (req, res) => {
    const choice = parse(TimeZoneChoiceSchema, req)
    res.json({ setting: await account.chooseTimeZone(ctx, req.user!.id, choice) })
  })
  router.post('/time-zone/browser', async (req, res) => {
    const { timeZone } = parse(BrowserTimeZoneSchema, req)
    res.json({ setting: await account.reportBrowserTimeZone(ctx, req.user!.id, timeZone) })
  })
  return router
}
