// /api/progress endpoints: a student's statistics (own, or `student` for their teachers).
import type { CyclePositionAnswer, DrillId } from '../contract/drills'
import type {
  ChordTonesAnswer,
  FingeringsAnswer,
  NotesAnswer,
  PositionsAnswer,
  SummaryAnswer,
  TemposAnswer,
  TimelineAnswer,
} from '../contract/progress'
import { http } from './http'

export type * from '../contract/progress'

/** Whose progress (omit for your own), on which instrument and drill, over which days (YYYY-MM-DD). */
export interface ProgressFilter {
  student?: string
  instrument?: string
  drill?: DrillId
  from?: string
  to?: string
}

const scope = ({ student, instrument, drill }: ProgressFilter) => ({ student, instrument, drill })

export const fetchSummary = (f: ProgressFilter) =>
  http.get<SummaryAnswer>('/progress/summary', { query: { ...f } })
export const fetchPositions = (f: ProgressFilter) =>
  http.get<PositionsAnswer>('/progress/positions', { query: scope(f) })
export const fetchNotes = (f: ProgressFilter) =>
  http.get<NotesAnswer>('/progress/notes', { query: scope(f) })
export const fetchTimeline = (f: ProgressFilter) =>
  http.get<TimelineAnswer>('/progress/timeline', { query: { ...f } })

export interface FingeringsParams {
  student?: string
  instrument?: string
  tonic: string
  scale: string
  lowFret: number
  highFret: number
}

/** How often each fingering of a key and region was practised in Range Runs. */
export const fetchFingerings = (p: FingeringsParams) =>
  http.get<FingeringsAnswer>('/progress/fingerings', { query: { ...p } })

/** Where the last Window Cycle session of a scale (of a plan item) stopped. */
export const fetchCyclePosition = (p: { scale: string; planItem?: string }) =>
  http.get<CyclePositionAnswer>('/progress/cycle-position', { query: { ...p } })
/** Chord Tones answers per chord type and degree (every instrument unless one is given). */
export const fetchChordTones = (p: { student?: string; instrument?: string }) =>
  http.get<ChordTonesAnswer>('/progress/chords', { query: { ...p } })
/** The fastest clean tempo of played takes per drill and settings, per day. */
export const fetchTempos = (f: ProgressFilter) =>
  http.get<TemposAnswer>('/progress/tempos', { query: { ...f } })
