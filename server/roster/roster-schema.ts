// Roster and student-page queries: filters, sort and page, the results export's dates (answers:
// src/contract/roster.ts).
import { z } from 'zod'
import { ROSTER_SORT_KEYS, ROSTER_STATUSES } from '../../src/contract/roster'
import { TimeZoneSchema } from '../../src/contract/attempts'

export const StudentIdParamsSchema = z.object({ id: z.uuid('Not a valid student id.') })

const RosterFilterFields = {
  search: z.string().trim().max(100, 'Use at most 100 characters.').optional(),
  studio: z.uuid('Not a valid studio id.').optional(),
  status: z.enum(ROSTER_STATUSES, 'Choose behind, on-track or inactive.').optional(),
  sortBy: z.enum(ROSTER_SORT_KEYS, 'Not a column the roster sorts by.').default('attention'),
  sortDesc: z.stringbool({ error: 'Use true or false.' }).default(false),
}

export const RosterQuerySchema = z.object({
  ...RosterFilterFields,
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
})
export type RosterQuery = z.infer<typeof RosterQuerySchema>

/** The viewer's time zone for the export's date-times (default: the one their browser last sent). */
const ExportZone = { timeZone: TimeZoneSchema.optional() }

export const RosterExportQuerySchema = z.object({ ...RosterFilterFields, ...ExportZone })
export type RosterFilter = z.infer<typeof RosterExportQuerySchema>

export const ResultsExportQuerySchema = z.object({
  from: z.iso.date('Use a date like 2026-01-31.').optional(),
  to: z.iso.date('Use a date like 2026-01-31.').optional(),
  ...ExportZone,
})
