// /api/worksheets endpoints: printable PDFs (neck, cycle, scatter, runs, chords) as Blobs.
import type { z } from 'zod'
import type {
  ChordsQuerySchema,
  CycleQuerySchema,
  NeckQuerySchema,
  RunsQuerySchema,
  ScatterQuerySchema,
  WorksheetKind,
} from '../contract/worksheets'
import { http } from './http'

export type { WorksheetKind }

/** What each sheet takes, as sent in the query string (the server's zod input types). */
export interface WorksheetParams {
  neck: z.input<typeof NeckQuerySchema>
  cycle: z.input<typeof CycleQuerySchema>
  scatter: z.input<typeof ScatterQuerySchema>
  runs: z.input<typeof RunsQuerySchema>
  chords: z.input<typeof ChordsQuerySchema>
}

type Query = Record<string, string | number | boolean | undefined>

/** The address of a sheet (for links that open it directly). */
export function worksheetPath<K extends WorksheetKind>(
  kind: K,
  params: WorksheetParams[K],
): string {
  const query = new URLSearchParams()
  for (const [name, value] of Object.entries(params as Query)) {
    if (value !== undefined && value !== '') query.set(name, String(value))
  }
  return `/api/worksheets/${kind}.pdf?${query.toString()}`
}

/** Downloads a sheet as a PDF Blob; bad settings come back as ApiError with field errors. */
export const fetchWorksheet = <K extends WorksheetKind>(kind: K, params: WorksheetParams[K]) =>
  http.file(`/worksheets/${kind}.pdf`, { query: params as Query })
