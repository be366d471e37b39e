// PostgreSQL cannot store NUL (U+0000) in text: refuse it at the boundary with a 400 per field,
// for every route, instead of a database error; bodies nested past any form of ours are refused too.
import type { RequestHandler } from 'express'
import { badRequest, type FieldErrors } from './errors'

const NUL = '\u0000'
const MESSAGE = 'Remove the NUL character (an invisible control character) from this text.'

/** Deeper than this, a body is refused: no form of ours nests past a handful of levels. */
export const MAX_BODY_DEPTH = 32
const TOO_DEEP = `Nested too deeply: at most ${MAX_BODY_DEPTH} levels of objects and lists.`

// A node of the walk points at its parent, so a path is only spelled out for a field with an error
// (copying the path at every level made a 50,000-level body block the event loop for a minute).
interface Step {
  item: unknown
  key: string | null
  parent: Step | null
  depth: number
}

function pathOf(step: Step): string {
  const keys: string[] = []
  for (let s: Step | null = step; s; s = s.parent) if (s.key !== null) keys.push(s.key)
  return keys.reverse().join('.') || '_'
}

/**
 * Field errors for every string (or key) holding NUL, and for nesting deeper than MAX_BODY_DEPTH,
 * keyed by dotted path like fieldErrors().
 */
export function nulFieldErrors(value: unknown, prefix?: string): FieldErrors {
  const fields: FieldErrors = {}
  // An explicit stack: a deeply nested body must not overflow the call stack.
  const stack: Step[] = [{ item: value, key: prefix ?? null, parent: null, depth: 0 }]
  while (stack.length) {
    const step = stack.pop()!
    const { item } = step
    if (typeof item === 'string') {
      if (item.includes(NUL)) fields[pathOf(step)] = [MESSAGE]
    } else if (item !== null && typeof item === 'object') {
      if (step.depth >= MAX_BODY_DEPTH) {
        fields[pathOf(step)] = [TOO_DEEP]
        continue
      }
      for (const [key, child] of Object.entries(item)) {
        const next = {
          item: child,
          key: key.replaceAll(NUL, '\\0'),
          parent: step,
          depth: step.depth + 1,
        }
        if (key.includes(NUL)) fields[pathOf(next)] = [MESSAGE]
        stack.push(next)
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
