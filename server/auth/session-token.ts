// The session cookie holds a JWT naming the user and a server-side session (sessions table), so a
// session ends the moment its row is deleted. Cookie names get the __Host- prefix over HTTPS.
import type { Request, Response } from 'express'
import { createSecretKey, type KeyObject } from 'node:crypto'
import jwt from 'jsonwebtoken'
import { cookiesAreSecure, type Config } from '../config'

export const SESSION_COOKIE = 'ambitus_session'
export const SESSION_DAYS = 7

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
  sid: string
}

/** Signs a session token for a user's session row. */
export function signSession(claims: SessionClaims, secret: string): string {
  return jwt.sign(claims, keyFor(secret), { algorithm: 'HS256', expiresIn: `${SESSION_DAYS}d` })
}

/** Verifies a session token; returns null when it is missing, tampered with or expired. */
export function verifySession(token: string | undefined, secret: string): SessionClaims | null {
  if (!token) return null
  try {
    const payload = jwt.verify(token, keyFor(secret), { algorithms: ['HS256'] })
    if (typeof payload !== 'object' || typeof payload.sub !== 'string') return null
    if (typeof payload.sid !== 'string') return null
    return { sub: payload.sub, sid: payload.sid }
  } catch {
    return null
  }
}

/** `__Host-` binds the cookie to this exact origin over HTTPS (no Domain, Path=/, Secure). */
export const cookieName = (config: Config, base: string) =>
  cookiesAreSecure(config) ? `__Host-${base}` : base

export const sessionCookieName = (config: Config) => cookieName(config, SESSION_COOKIE)

/** Cookie attributes for our own cookies: httpOnly, SameSite=Lax, Secure per configuration. */
export const cookieOptions = (config: Config) => ({
  httpOnly: true,
  sameSite: 'lax' as const,
  secure: cookiesAreSecure(config),
  path: '/',
})

export const readSessionToken = (config: Config, req: Request): string | undefined =>
  req.cookies?.[sessionCookieName(config)]

export function setSessionCookie(config: Config, res: Response, token: string) {
  res.cookie(sessionCookieName(config), token, {
    ...cookieOptions(config),
    maxAge: SESSION_DAYS * 24 * 3600 * 1000,
  })
}

export function clearSessionCookie(config: Config, res: Response) {
  res.clearCookie(sessionCookieName(config), cookieOptions(config))
}
