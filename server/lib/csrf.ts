// Anti-CSRF: every state-changing API request must carry `X-Requested-With: ambitus`. A form or
// image on another site cannot set a header, and a cross-site script that sets one needs a CORS
// preflight this server never grants; so bodyless POSTs and multipart uploads are covered too.
import type { RequestHandler } from 'express'
import { AppError } from './errors'

export const CSRF_HEADER = 'X-Requested-With'
export const CSRF_VALUE = 'ambitus'
const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS'])

export const requireCsrfHeader: RequestHandler = (req, _res, next) => {
  if (SAFE_METHODS.has(req.method) || req.get(CSRF_HEADER) === CSRF_VALUE) return next()
  throw new AppError(
    'csrf',
    'This request did not come from the Ambitus app. Reload the page and try again.',
    403,
  )
}
