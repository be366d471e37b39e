// requireAuth reads the session cookie and loads the user; requireRole limits a route to roles.
import type { RequestHandler } from 'express'
import type { AppContext } from '../context'
import { forbidden, unauthorized } from '../lib/errors'
import { findUserById, toPublicUser } from '../users/users-repository'
import type { Role } from '../users/users-schema'
import { SESSION_COOKIE, verifySession } from './session-token'

/** Rejects requests without a valid session with 401; sets req.user otherwise. */
export function requireAuth(ctx: AppContext): RequestHandler {
  return async (req, _res, next) => {
    const claims = verifySession(req.cookies?.[SESSION_COOKIE], ctx.config.jwtSecret)
    const user = claims ? await findUserById(ctx.db, claims.sub) : null
    if (!user || !claims || user.passwordChangedAt.getTime() !== claims.pwc) {
      throw unauthorized('Your session has ended. Please sign in again.')
    }
    req.user = toPublicUser(user)
    next()
  }
}

/** Allows only the given roles (use after requireAuth); others get 403. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) throw unauthorized()
    if (!roles.includes(req.user.role))
      throw forbidden(`This is only for ${roles.join(' or ')} accounts.`)
    next()
  }
}
