// The only place that calls fetch: JSON in and out, same-origin cookies, errors as ApiError.

/**
 * Sent with every request: the server refuses state-changing requests without it (anti-CSRF; a
 * form or script on another site cannot add it). Multipart uploads go through here too.
 */
export const CSRF_HEADERS = { 'X-Requested-With': 'ambitus' } as const

export type FieldErrors = Record<string, string[]>

/** An error answered by the API ({ error: { code, message, fields? } }) or a network failure. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: FieldErrors = {},
  ) {
    super(message)
  }
}

type UnauthorizedHandler = (error: ApiError) => void
let onUnauthorized: UnauthorizedHandler | null = null

/** Registers the one place that reacts to a 401 (the auth store sends the user to sign-in). */
export function setUnauthorizedHandler(handler: UnauthorizedHandler | null) {
  onUnauthorized = handler
}

async function toApiError(response: Response): Promise<ApiError> {
  const body = (await response.json().catch(() => null)) as {
    error?: { code?: string; message?: string; fields?: FieldErrors }
  } | null
  const e = body?.error
  return new ApiError(
    response.status,
    e?.code ?? 'http_error',
    e?.message ?? response.statusText,
    e?.fields,
  )
}

export interface RequestOptions {
  query?: Record<string, string | number | boolean | undefined>
  body?: unknown
  /** Skip the global 401 handler (used by the session check itself). */
  quiet401?: boolean
  /** Read the answer as a Blob (files such as PDFs) instead of JSON. */
  blob?: boolean
}

/** The path with its query string (empty values left out). */
export function withQuery(path: string, query: RequestOptions['query']) {
  const params = new URLSearchParams()
  for (const [k, v] of Object.entries(query ?? {}))
    if (v !== undefined && v !== '') params.set(k, String(v))
  const qs = params.toString()
  return qs ? `${path}?${qs}` : path
}

/** Calls /api{path}; resolves to the parsed JSON (undefined for 204) or throws ApiError. */
export async function request<T>(
  method: string,
  path: string,
  options: RequestOptions = {},
): Promise<T> {
  const init: RequestInit = {
    method,
    credentials: 'same-origin',
    headers: { accept: 'application/json', ...CSRF_HEADERS },
  }
  if (options.body instanceof FormData) init.body = options.body
  else if (options.body !== undefined) {
    init.body = JSON.stringify(options.body)
    init.headers = { ...init.headers, 'content-type': 'application/json' }
  }
  let response: Response
  try {
    response = await fetch(`/api${withQuery(path, options.query)}`, init)
  } catch {
    throw new ApiError(
      0,
      'network',
      'Cannot reach the server. Check your connection and try again.',
    )
  }
  if (!response.ok) {
    const error = await toApiError(response)
    if (error.status === 401 && !options.quiet401) onUnauthorized?.(error)
    throw error
  }
  if (response.status === 204) return undefined as T
  if (options.blob) return (await response.blob()) as T
  return (await response.json()) as T
}

export const http = {
  get: <T>(path: string, options?: RequestOptions) => request<T>('GET', path, options),
  post: <T>(path: string, body?: unknown, options?: RequestOptions) =>
    request<T>('POST', path, { ...options, body }),
  put: <T>(path: string, body?: unknown, options?: RequestOptions) =>
    request<T>('PUT', path, { ...options, body }),
  patch: <T>(path: string, body?: unknown, options?: RequestOptions) =>
    request<T>('PATCH', path, { ...options, body }),
  delete: <T>(path: string, options?: RequestOptions) => request<T>('DELETE', path, options),
  /** GET a file: resolves to a Blob, errors as ApiError like every other call. */
  file: (path: string, options?: RequestOptions) =>
    request<Blob>('GET', path, { ...options, blob: true }),
}
