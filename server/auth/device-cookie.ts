// Device cookies: after a successful sign-in the browser gets a signed token naming the account, so
// later sign-ins from it skip the account's lock-out back-off (OWASP "Slow Down Online Guessing
// Attacks with Device Cookies"). It grants nothing else: the password is still required.
import type { Request, Response } from 'express'
import { createHmac, randomBytes, timingSafeEqual } from 'node:crypto'
import type { Config } from '../config'
import { cookieName, cookieOptions } from './session-token'

const DEVICE_COOKIE = 'ambitus_device'
const DEVICE_DAYS = 365

export interface Device {
  userId: string
  nonce: string
}

const mac = (secret: string, userId: string, nonce: string) =>
  createHmac('sha256', secret).update(`device|${userId}|${nonce}`).digest('base64url')

/** The device cookie of this request when its signature holds; null otherwise. */
export function readDevice(config: Config, req: Request): Device | null {
  const value: unknown = req.cookies?.[cookieName(config, DEVICE_COOKIE)]
  if (typeof value !== 'string') return null
  const [userId, nonce, signature] = value.split('.')
  if (!userId || !nonce || !signature) return null
  const expected = Buffer.from(mac(config.jwtSecret, userId, nonce))
  const given = Buffer.from(signature)
  if (given.length !== expected.length || !timingSafeEqual(given, expected)) return null
  return { userId, nonce }
}

/** Gives this browser a fresh device cookie for the account it just signed in to. */
export function setDeviceCookie(config: Config, res: Response, userId: string) {
  const nonce = randomBytes(16).toString('base64url')
  res.cookie(
    cookieName(config, DEVICE_COOKIE),
    `${userId}.${nonce}.${mac(config.jwtSecret, userId, nonce)}`,
    { ...cookieOptions(config), maxAge: DEVICE_DAYS * 24 * 3600 * 1000 },
  )
}
