// requireAuth finds the request's live session and its user; requireRole limits a route to roles.
import type { RequestHandler } from 'express'
import type { AppContext } from '../context'
import { forbidden, unauthorized } from '../lib/errors'
import { toPublicUser } from '../users/users-repository'
import type { Role } from '../users/users-schema'
import { sessionOf } from './sessions'

/** Rejects requests without a live session with 401; sets req.user and req.sessionId otherwise. */
export function requireAuth(ctx: AppContext): RequestHandler {
  return async (req, _res, next) => {
    const session = await sessionOf(ctx, req)
    if (!session) throw unauthorized('Your session has ended. Please sign in again.')
    req.user = toPublicUser(session.user)
    req.sessionId = session.sessionId
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
