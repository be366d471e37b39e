// The teacher's roster: one row per student with the week's practice, plan progress, weak spots and
// a status; and GET /api/studio/students, one row per studio membership (a contract outside checks use).

/** GET /api/studio/students: one row per studio membership. */
export interface StudioStudent {
  id: string
  name: string
  email: string
  studioId: string
  studioName: string
  joinedAt: string
  lastPracticeAt: string | null
  accuracy: number | null
  /** The student's active instrument (null before they set one up). */
  instrument: RosterInstrument | null
}

export const ROSTER_STATUSES = ['behind', 'on-track', 'inactive'] as const
export type RosterStatus = (typeof ROSTER_STATUSES)[number]

/** How a status reads on screen and in the CSV export. */
export const ROSTER_STATUS_TEXT: Record<RosterStatus, string> = {
  behind: 'Behind',
  inactive: 'Quiet',
  'on-track': 'On track',
}

export const ROSTER_SORT_KEYS = [
  'attention',
  'name',
  'email',
  'lastPracticeAt',
  'minutesThisWeek',
  'accuracy',
  'recallTrend',
  'planCompletion',
  'status',
  'fastestTempo',
] as const
export type RosterSortKey = (typeof ROSTER_SORT_KEYS)[number]

export interface WeakSpot {
  string: number
  fret: number
  /** e.g. "A string, fret 7 (E2)" */
  label: string
  accuracy: number
  attempts: number
}

export interface RecallTrend {
  /** Median response of correct answers in the last 7 days, and in the 7 days before. */
  medianMs: number | null
  previousMedianMs: number | null
  /** this week's median / last week's − 1: negative when recall got faster (−0.1 = 10 % faster). */
  change: number | null
  direction: 'faster' | 'slower' | 'steady' | null
}

/** Why a student needs the teacher's attention, most pressing kinds first. */
export const ATTENTION_KINDS = [
  'overdue',
  'behind-targets',
  'no-practice',
  'accuracy-falling',
  'recall-slowing',
] as const
export type AttentionKind = (typeof ATTENTION_KINDS)[number]

export interface AttentionReason {
  kind: AttentionKind
  /** In words, e.g. "No practice for 9 days", "Accuracy down from 86 % to 64 %". */
  text: string
}

/** The student's active instrument as the roster shows it. */
export interface RosterInstrument {
  name: string
  /** "5-string bass (B E A D G)", "6 strings (D A D G B E)" */
  description: string
  leftHanded: boolean
  /** Open strings, lowest first (MIDI numbers), its frets and how it spells notes. */
  tuning: number[]
  frets: number
  accidentals: 'sharp' | 'flat'
}

/** The fastest clean tempo of a played take in the last 7 days, any drill. */
export interface FastestTempo {
  bpm: number
  /** The drill's id ("runs"); its name comes from drillName. */
  drill: string
  /** The take's settings in words ("C major, frets 2–5"), when it named them. */
  settings: string | null
}

export interface RosterRow {
  id: string
  name: string
  email: string
  studios: { id: string; name: string }[]
  lastPracticeAt: string | null
  minutesThisWeek: number
  attemptsThisWeek: number
  /** Share of correct answers over the last 7 days. */
  accuracy: number | null
  recall: RecallTrend
  plans: {
    assigned: number
    complete: number
    overdue: number
    targetsMet: number
    targetsTotal: number
  }
  /** targetsMet / targetsTotal over assigned plans; null with none assigned. */
  planCompletion: number | null
  weakSpots: WeakSpot[]
  status: RosterStatus
  /** Reasons to look at this student now, most pressing first; empty when all is well. */
  attention: AttentionReason[]
  instrument: RosterInstrument | null
  /** Null when no take was played clean in the last 7 days. */
  fastestTempo: FastestTempo | null
  /** The student shares practice with this teacher from this instant on; null: all of it. */
  sharesFrom: string | null
}

export interface RosterPage {
  total: number
  items: RosterRow[]
}
