// /api/auth: register, sign in and out, current user, change and reset password.
import { Router } from 'express'
import { rateLimit } from 'express-rate-limit'
import type { AppContext } from '../context'
import { AppError } from '../lib/errors'
import { parse } from '../lib/validate'
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
import { clearSessionCookie, setSessionCookie, signSession } from './session-token'

function limiter(limit: number, windowMs: number, skipSuccessfulRequests = false) {
  return rateLimit({
    windowMs,
    limit,
    skipSuccessfulRequests,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) =>
      next(
        new AppError(
          'rate_limited',
          'Too many attempts. Please wait a few minutes and try again.',
          429,
        ),
      ),
  })
}

export function authRoutes(ctx: AppContext): Router {
  const router = Router()
  const signInLimit = limiter(ctx.config.loginAttemptsPer15Min, 15 * 60 * 1000, true)
  const resetRequestLimit = limiter(ctx.config.resetRequestsPerHour, 60 * 60 * 1000)
  const resetConfirmLimit = limiter(ctx.config.resetRequestsPerHour, 60 * 60 * 1000, true)

  router.post('/register', async (req, res) => {
    const user = await auth.register(ctx, parse(RegisterSchema, req))
    setSessionCookie(req, res, signSession(user, ctx.config.jwtSecret))
    res.status(201).json({ user: toPublicUser(user) })
  })

  router.post('/login', signInLimit, async (req, res) => {
    const user = await auth.login(ctx, parse(LoginSchema, req))
    setSessionCookie(req, res, signSession(user, ctx.config.jwtSecret))
    res.json({ user: toPublicUser(user) })
  })

  router.post('/logout', (req, res) => {
    clearSessionCookie(req, res)
    res.status(204).end()
  })

  router.get('/me', requireAuth(ctx), (req, res) => {
    res.json({ user: req.user })
  })

  router.post('/password', requireAuth(ctx), signInLimit, async (req, res) => {
    const user = await auth.changePassword(ctx, req.user!.id, parse(ChangePasswordSchema, req))
    setSessionCookie(req, res, signSession(user, ctx.config.jwtSecret))
    res.status(204).end()
  })

  router.post('/password-reset', resetRequestLimit, async (req, res) => {
    await auth.requestPasswordReset(ctx, parse(ResetRequestSchema, req).email)
    res.status(202).json({ message: 'If that e-mail has an account, a reset link is on its way.' })
  })

  router.post('/password-reset/confirm', resetConfirmLimit, async (req, res) => {
    const { token, password } = parse(ResetConfirmSchema, req)
    await auth.confirmPasswordReset(ctx, token, password)
    res.status(204).end()
  })

  return router
}
