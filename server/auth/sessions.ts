// Sessions: start one (row + cookie), find the one a request carries, end one or all of a user's.
import type { Request, Response } from 'express'
import type { AppContext } from '../context'
import type { UserRecord } from '../users/users-repository'
import {
  clearSessionCookie,
  readSessionToken,
  SESSION_DAYS,
  setSessionCookie,
  signSession,
  verifySession,
} from './session-token'
import {
  deleteSession,
  deleteUserSessions,
  findSessionUser,
  insertSession,
} from './sessions-repository'

/** A new session row for the user and its signed token (also used by tests and benchmarks). */
export async function issueSessionToken(ctx: Pick<AppContext, 'db' | 'config'>, userId: string) {
  const expiresAt = new Date(Date.now() + SESSION_DAYS * 24 * 3600 * 1000)
  const sid = await insertSession(ctx.db, userId, expiresAt)
  return signSession({ sub: userId, sid }, ctx.config.jwtSecret)
}

/** Signs the user in on this browser. */
export async function startSession(ctx: AppContext, res: Response, user: { id: string }) {
  setSessionCookie(ctx.config, res, await issueSessionToken(ctx, user.id))
}

/** The live session a request carries, with its (enabled) user; null when there is none. */
export async function sessionOf(
  ctx: AppContext,
  req: Request,
): Promise<{ user: UserRecord; sessionId: string } | null> {
  const claims = verifySession(readSessionToken(ctx.config, req), ctx.config.jwtSecret)
  if (!claims) return null
  const user = await findSessionUser(ctx.db, claims.sid, claims.sub)
  return user ? { user, sessionId: claims.sid } : null
}

/** Signs this browser out: its session row goes, so the cookie is worthless even if kept. */
export async function endSession(ctx: AppContext, req: Request, res: Response) {
  const claims = verifySession(readSessionToken(ctx.config, req), ctx.config.jwtSecret)
  if (claims) await deleteSession(ctx.db, claims.sid)
  clearSessionCookie(ctx.config, res)
}

/** Ends every session of a user (password change or reset, role change, disabled, on request). */
export const endAllSessions = (ctx: Pick<AppContext, 'db'>, userId: string, keep?: string) =>
  deleteUserSessions(ctx.db, userId, keep)
