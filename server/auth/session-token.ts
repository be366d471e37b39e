// The session is a JWT in an httpOnly cookie; it names the user and the password version.
import type { Request, Response } from 'express'
import { createSecretKey, type KeyObject } from 'node:crypto'
import jwt from 'jsonwebtoken'
import type { UserRecord } from '../users/users-repository'

export const SESSION_COOKIE = 'ambitus_session'
const SESSION_DAYS = 7

// jsonwebtoken probes a string secret as a public key (and catches the throw) on every call; a
// key object built once per secret skips that work on the hot path of every signed-in request.
const KEYS = new Map<string, KeyObject>()
function keyFor(secret: string): KeyObject {
  let key = KEYS.get(secret)
  if (!key) KEYS.set(secret, (key = createSecretKey(Buffer.from(secret, 'utf8'))))
  return key
}

export interface SessionClaims {
  sub: string
  pwc: number
}

/** Signs a session token for a user; changing the password invalidates older tokens. */
export function signSession(user: UserRecord, secret: string): string {
  const claims: SessionClaims = { sub: user.id, pwc: user.passwordChangedAt.getTime() }
  return jwt.sign(claims, keyFor(secret), { algorithm: 'HS256', expiresIn: `${SESSION_DAYS}d` })
}

/** Verifies a session token; returns null when it is missing, tampered with or expired. */
export function verifySession(token: string | undefined, secret: string): SessionClaims | null {
  if (!token) return null
  try {
    const payload = jwt.verify(token, keyFor(secret), { algorithms: ['HS256'] })
    if (typeof payload !== 'object' || typeof payload.sub !== 'string') return null
    if (typeof payload.pwc !== 'number') return null
    return { sub: payload.sub, pwc: payload.pwc }
  } catch {
    return null
  }
}

export function setSessionCookie(req: Request, res: Response, token: string) {
  res.cookie(SESSION_COOKIE, token, {
    httpOnly: true,
    sameSite: 'lax',
    secure: req.secure,
    path: '/',
    maxAge: SESSION_DAYS * 24 * 3600 * 1000,
  })
}

export function clearSessionCookie(req: Request, res: Response) {
  res.clearCookie(SESSION_COOKIE, {
    httpOnly: true,
    sameSite: 'lax',
    secure: req.secure,
    path: '/',
  })
}
