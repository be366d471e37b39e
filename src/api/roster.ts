// The roster (/api/studio/roster, its CSV), the students list and a student's page.
import type { Assignment } from '../contract/assignments'
import type {
  RosterInstrument,
  RosterPage,
  RosterRow,
  RosterSortKey,
  RosterStatus,
  StudioStudent,
} from '../contract/roster'
import { http, withQuery } from './http'

export type { RosterInstrument, RosterPage, RosterRow, RosterSortKey, RosterStatus, StudioStudent }

export interface RosterFilters {
  search?: string
  studio?: string
  status?: RosterStatus
  sortBy?: RosterSortKey
  sortDesc?: boolean
}
export type RosterQuery = RosterFilters & { page?: number; pageSize?: number }

export const listStudents = () => http.get<{ students: StudioStudent[] }>('/studio/students')
export const fetchRoster = (query: RosterQuery) =>
  http.get<RosterPage>('/studio/roster', { query: { ...query } })
export const fetchStudent = (id: string) =>
  http.get<{ student: RosterRow }>(`/studio/students/${id}`)
export const fetchStudentAssignments = (id: string) =>
  http.get<{ assignments: Assignment[] }>(`/studio/students/${id}/assignments`)

/** Download links (plain same-origin links carry the session cookie). */
// with the viewer's time zone, so the sheet's date-times are their local ones
export const rosterCsvUrl = (filters: RosterFilters, timeZone: string) =>
  `/api${withQuery('/studio/roster.csv', { ...filters, timeZone })}`
export const resultsCsvUrl = (studentId: string, timeZone: string) =>
  `/api${withQuery(`/studio/students/${studentId}/results.csv`, { timeZone })}`
