// zod at the boundary: parse params, query and body of a request, or throw a 400 with field errors.
import type { Request } from 'express'
import type { z } from 'zod'
import { badRequest, fieldErrors, type FieldErrors } from './errors'
import { nulFieldErrors } from './text-guard'

type Part = 'params' | 'query' | 'body'

function parsePart<S extends z.ZodType>(
  schema: S,
  value: unknown,
  part: Part,
  fields: FieldErrors,
) {
  // Bodies parsed after the API-wide guard (multipart fields) are checked here too.
  const nul = nulFieldErrors(value, part === 'body' ? undefined : part)
  if (Object.keys(nul).length) {
    Object.assign(fields, nul)
    return undefined
  }
  const result = schema.safeParse(value ?? {})
  if (result.success) return result.data as z.infer<S>
  Object.assign(fields, fieldErrors(result.error, part === 'body' ? undefined : part))
  return undefined
}

/** Parses one part of the request with its schema. */
export function parse<S extends z.ZodType>(
  schema: S,
  req: Request,
  part: Part = 'body',
): z.infer<S> {
  const fields: FieldErrors = {}
  const data = parsePart(schema, req[part], part, fields)
  if (data === undefined) throw badRequest('Some fields need attention.', fields)
  return data
}

/** Parses several parts at once so the client sees every problem in one answer. */
export function parseRequest<
  P extends z.ZodType = z.ZodType<Record<string, never>>,
  Q extends z.ZodType = z.ZodType<Record<string, never>>,
  B extends z.ZodType = z.ZodType<Record<string, never>>,
>(req: Request, schemas: { params?: P; query?: Q; body?: B }) {
  const fields: FieldErrors = {}
  const out: Record<string, unknown> = {}
  for (const part of ['params', 'query', 'body'] as const) {
    const schema = schemas[part]
    if (schema) out[part] = parsePart(schema, req[part], part, fields)
  }
  if (Object.keys(fields).length) throw badRequest('Some fields need attention.', fields)
  return out as { params: z.infer<P>; query: z.infer<Q>; body: z.infer<B> }
}
