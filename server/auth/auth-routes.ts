// /api/auth: register, sign in and out (here or everywhere), current user, change and reset password.
import { Router, type Response } from 'express'
import type { AppContext } from '../context'
import { parse } from '../lib/validate'
import {
  bodyEmail,
  BY_ADDRESS,
  clientAddress,
  inSequence,
  limitRequests,
  signUpLimit,
} from '../lib/rate-limits'
import { toPublicUser } from '../users/users-repository'
import {
  ChangePasswordSchema,
  LoginSchema,
  RegisterSchema,
  ResetConfirmSchema,
  ResetRequestSchema,
} from './auth-schema'
import * as auth from './auth-service'
import { requireAuth } from './auth-middleware'
import { readDevice, setDeviceCookie } from './device-cookie'
import { clearSessionCookie } from './session-token'
import { endAllSessions, endSession, startSession } from './sessions'

const HOUR = 60 * 60 * 1000

/** Runs work once the answer has been handed to the network (or the client has gone). */
function afterResponse(res: Response, work: () => Promise<void>) {
  let started = false
  const start = () => {
    if (started) return
    started = true
    work().catch((err) => res.req.log.error({ err }, 'work after the response failed'))
  }
  res.once('finish', start).once('close', start)
}

function resetLimits(ctx: AppContext) {
  const limit = ctx.config.resetRequestsPerHour
  return {
    request: inSequence([
      limitRequests(ctx, { name: 'reset:address', limit, windowMs: HOUR, keyOf: BY_ADDRESS }),
      limitRequests(ctx, { name: 'reset:email', limit: 3, windowMs: HOUR, keyOf: bodyEmail }),
    ]),
    confirm: limitRequests(ctx, {
      name: 'reset-confirm:address',
      limit,
      windowMs: HOUR,
      keyOf: BY_ADDRESS,
      skipSuccessfulRequests: true,
    }),
  }
}

export function authRoutes(ctx: AppContext): Router {
  const router = Router()
  const resets = resetLimits(ctx)

  router.post('/register', signUpLimit(ctx), async (req, res) => {
    const user = await auth.register(ctx, parse(RegisterSchema, req))
    await startSession(ctx, res, user)
    setDeviceCookie(ctx.config, res, user.id)
    res.status(201).json({ user: toPublicUser(user) })
  })

  router.post('/login', async (req, res) => {
    const input = parse(LoginSchema, req)
    const client = { address: clientAddress(req), device: readDevice(ctx.config, req) }
    const user = await auth.signIn(ctx, input, client)
    await startSession(ctx, res, user)
    setDeviceCookie(ctx.config, res, user.id)
    res.json({ user: toPublicUser(user) })
  })

  router.post('/logout', async (req, res) => {
    await endSession(ctx, req, res)
    res.status(204).end()
  })

  router.post('/logout-everywhere', requireAuth(ctx), async (req, res) => {
    await endAllSessions(ctx, req.user!.id)
    clearSessionCookie(ctx.config, res)
    res.status(204).end()
  })

  router.get('/me', requireAuth(ctx), (req, res) => {
    res.json({ user: req.user })
  })

  router.post('/password', requireAuth(ctx), async (req, res) => {
    const input = parse(ChangePasswordSchema, req)
    await auth.changePassword(ctx, { userId: req.user!.id, sessionId: req.sessionId }, input)
    res.status(204).end()
  })

  router.post('/password-reset', resets.request, (req, res) => {
    const { email } = parse(ResetRequestSchema, req)
    // Answer first, then look up and send: the answer takes as long whether the account exists.
    afterResponse(res, () => auth.requestPasswordReset(ctx, email))
    res.status(202).json({ message: 'If that e-mail has an account, a reset link is on its way.' })
  })

  router.post('/password-reset/confirm', resets.confirm, async (req, res) => {
    const { token, password } = parse(ResetConfirmSchema, req)
    await auth.confirmPasswordReset(ctx, token, password)
    res.status(204).end()
  })

  return router
}
