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

/** Turns a zod error into per-field messages keyed by dotted path ("body.email"). */
export function fieldErrors(error: z.ZodError, prefix?: string): FieldErrors {
  const fields: FieldErrors = {}
  for (const issue of error.issues) {
    const key = [prefix, ...issue.path.map(String)].filter(Boolean).join('.') || '_'
    ;(fields[key] ??= []).push(issue.message)
  }
  return fields
}

/** Converts errors thrown by body parsers and libraries into client errors. */
function fromLibraryError(error: unknown): AppError | null {
  if (error instanceof AppError) return error
  if (error instanceof RangeError) return badRequest(error.message)
  const e = error as { type?: string; status?: number; code?: string; message?: string }
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
    const { code, message, fields } = appError
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
