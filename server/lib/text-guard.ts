// PostgreSQL cannot store NUL (U+0000) in text: refuse it at the boundary with a 400 per field,
// for every route, instead of a database error.
import type { RequestHandler } from 'express'
import { badRequest, type FieldErrors } from './errors'

const NUL = '\u0000'
const MESSAGE = 'Remove the NUL character (an invisible control character) from this text.'

/** Field errors for every string (or key) holding NUL, keyed by dotted path like fieldErrors(). */
export function nulFieldErrors(value: unknown, prefix?: string): FieldErrors {
  const fields: FieldErrors = {}
  // An explicit stack: a deeply nested body must not overflow the call stack.
  const stack: [unknown, string[]][] = [[value, prefix ? [prefix] : []]]
  while (stack.length) {
    const [item, path] = stack.pop()!
    if (typeof item === 'string') {
      if (item.includes(NUL)) fields[path.join('.') || '_'] = [MESSAGE]
    } else if (item !== null && typeof item === 'object') {
      for (const [key, child] of Object.entries(item)) {
        const childPath = [...path, key.replaceAll(NUL, '\\0')]
        if (key.includes(NUL)) fields[childPath.join('.')] = [MESSAGE]
        stack.push([child, childPath])
      }
    }
  }
  return fields
}

/** Middleware: a JSON body or query string with NUL anywhere is a 400 before any route runs. */
export const rejectNulText: RequestHandler = (req, _res, next) => {
  const fields = { ...nulFieldErrors(req.body), ...nulFieldErrors(req.query, 'query') }
  if (Object.keys(fields).length) throw badRequest('Some fields need attention.', fields)
  next()
}
