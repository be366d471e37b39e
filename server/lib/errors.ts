// One error path: services throw AppError; the error middleware writes { error: { code, message, fields? } }.
import type { ErrorRequestHandler, RequestHandler } from 'express'
import { z } from 'zod'

export type FieldErrors = Record<string, string[]>

/** An error meant for the client: a stable code, a readable message, an HTTP status. */
export class AppError extends Error {
  constructor(
    readonly code: string,
    message: string,
    readonly status: number,
    readonly fields?: FieldErrors,
    readonly headers?: Record<string, string>,
  ) {
    super(message)
  }
}

export const badRequest = (message: string, fields?: FieldErrors) =>
  new AppError('invalid_input', message, 400, fields)
export const unauthorized = (message = 'Please sign in.') =>
  new AppError('unauthorized', message, 401)
export const forbidden = (message = 'You do not have access to this.') =>
  new AppError('forbidden', message, 403)
export const notFound = (what = 'That') => new AppError('not_found', `${what} was not found.`, 404)
export const conflict = (message: string, fields?: FieldErrors) =>
  new AppError('conflict', message, 409, fields)
const TOO_MANY = 'Too many attempts. Please wait a few minutes and try again.'
/** 429, with Retry-After in whole seconds when known (express-rate-limit sets its own). */
export const rateLimited = (retryAfterMs?: number, message = TOO_MANY) =>
  new AppError(
    'rate_limited',
    message,
    429,
    undefined,
    retryAfterMs === undefined
      ? undefined
      : { 'Retry-After': String(Math.max(1, Math.ceil(retryAfterMs / 1000))) },
  )

/** Turns a zod error into per-field messages keyed by dotted path ("body.email"). */
export function fieldErrors(error: z.ZodError, prefix?: string): FieldErrors {
  const fields: FieldErrors = {}
  for (const issue of error.issues) {
    const key = [prefix, ...issue.path.map(String)].filter(Boolean).join('.') || '_'
    ;(fields[key] ??= []).push(issue.message)
  }
  return fields
}

/**
 * PostgreSQL refusing a value (class 22: too long, bad encoding, NUL, out of range…) is the
 * client's input, so a 400; a unique violation is a conflict (two requests raced).
 */
function fromDatabaseError(e: { code?: string; severity?: string }): AppError | null {
  if (typeof e.severity !== 'string' || typeof e.code !== 'string') return null
  if (e.code.startsWith('22')) return badRequest('A value is not valid for its field.')
  if (e.code === '23505') return conflict('That already exists; reload and try again.')
  return null
}

/** Converts errors thrown by body parsers and libraries into client errors. */
function fromLibraryError(error: unknown): AppError | null {
  if (error instanceof AppError) return error
  if (error instanceof RangeError) return badRequest(error.message)
  const e = error as { type?: string; status?: number; code?: string; message?: string }
  const database = fromDatabaseError(error as { code?: string; severity?: string })
  if (database) return database
  // Every database connection busy for the pool's whole wait: overload, not a fault; try again.
  if ((error as { name?: string }).name === 'KnexTimeoutError') {
    return new AppError('busy', 'The server is busy; try again in a moment.', 503, undefined, {
      'Retry-After': '5',
    })
  }
  if (e.type === 'entity.too.large' || e.code === 'LIMIT_FILE_SIZE') {
    return new AppError('too_large', 'The upload is too large.', 413)
  }
  if (e.type === 'entity.parse.failed') return badRequest('The request body is not valid JSON.')
  if (e.type === 'encoding.unsupported' || e.type === 'charset.unsupported') {
    return new AppError('unsupported_media', 'Unsupported request encoding.', 415)
  }
  if (typeof e.status === 'number' && e.status >= 400 && e.status < 500) {
    return new AppError('bad_request', e.message ?? 'Bad request.', e.status)
  }
  return null
}

export const errorHandler: ErrorRequestHandler = (error, req, res, _next) => {
  const appError = fromLibraryError(error)
  if (appError) {
    const { code, message, fields, headers } = appError
    if (headers) res.set(headers)
    // A database refusal answered as 4xx is still worth a line: it names the column and value.
    if ('severity' in Object(error)) req.log?.warn({ err: error }, `database refused input`)
    res.status(appError.status).json({ error: { code, message, ...(fields ? { fields } : {}) } })
    return
  }
  req.log?.error({ err: error }, 'unhandled error')
  const requestId = String(req.id ?? '')
  res.status(500).json({
    error: {
      code: 'internal',
      message: `Something went wrong on our side (request ${requestId}).`,
    },
  })
}

export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(
    new AppError(
      'not_found',
      `No API route for ${req.method} ${req.originalUrl.split('?')[0]}.`,
      404,
    ),
  )
}
