// Progress API: query schemas (zod, validated at the boundary) and the answer shapes the client imports.
import { z } from 'zod'
import { DrillIdSchema, type DrillId } from '../../src/drills/drill-settings'
import { scaleTypeName, tonicName } from '../../src/theory'

/** Longest date range one timeline request may cover. */
export const MAX_RANGE_DAYS = 800
const DAY_MS = 24 * 3600 * 1000

const accepts = (check: (v: string) => unknown) => (value: string) => {
  try {
    check(value)
    return true
  } catch {
    return false
  }
}

const Day = z.iso.date('Use a date like 2026-03-01.')
const Fret = z.coerce.number('Use a fret number.').int('Use a whole fret number.').min(0).max(30)

/** Whose data, which instrument, which drill: every progress read takes these. */
export const ProgressScopeSchema = z.strictObject({
  student: z.uuid('Not a valid student id.').optional(),
  instrument: z.uuid('Not a valid instrument id.').optional(),
  drill: DrillIdSchema.optional(),
})

export const RangeQuerySchema = ProgressScopeSchema.extend({
  from: Day.optional(),
  to: Day.optional(),
})
  .refine((q) => !q.from || !q.to || q.from <= q.to, {
    path: ['to'],
    message: 'The range ends before it starts.',
  })
  .refine(
    (q) => !q.from || !q.to || (Date.parse(q.to) - Date.parse(q.from)) / DAY_MS <= MAX_RANGE_DAYS,
    {
      path: ['from'],
      message: `Choose at most ${MAX_RANGE_DAYS} days.`,
    },
  )
export type ProgressScope = z.infer<typeof ProgressScopeSchema>
export type RangeQuery = z.infer<typeof RangeQuerySchema>

export const FingeringsQuerySchema = z
  .strictObject({
    student: z.uuid('Not a valid student id.').optional(),
    instrument: z.uuid('Not a valid instrument id.').optional(),
    tonic: z
      .string()
      .max(8)
      .refine(accepts(tonicName), 'Choose one of the 18 key tonics.')
      .transform((t) => tonicName(t)),
    scale: z
      .string()
      .max(40)
      .refine(accepts(scaleTypeName), 'Choose a known scale.')
      .transform((s) => scaleTypeName(s)),
    lowFret: Fret,
    highFret: Fret,
  })
  .refine((q) => q.lowFret <= q.highFret, {
    path: ['highFret'],
    message: 'The region ends before it starts.',
  })
export type FingeringsQuery = z.infer<typeof FingeringsQuerySchema>

/** The instrument the figures are about (enough to draw the board for a teacher too). */
export interface ProgressInstrument {
  id: string
  name: string
  tuning: number[]
  frets: number
  scaleLengthMm: number
  handedness: 'right' | 'left'
  accidentals: 'sharp' | 'flat'
  isActive: boolean
}

/** Figures of a place or a note. Accuracy is lifetime; "recent" is the latest 50 answers per place. */
export interface ItemFigures {
  attempts: number
  correct: number
  accuracy: number | null
  recentAnswers: number
  recentAccuracy: number | null
  /** Median and 90th percentile of the latest right answers' response times (ms). */
  medianMs: number | null
  p90Ms: number | null
  lastSeenAt: string | null
}

export interface PositionFigures extends ItemFigures {
  string: number
  fret: number
}

export interface PositionsAnswer {
  instrument: ProgressInstrument | null
  positions: PositionFigures[]
}

export interface NotesAnswer {
  instrument: ProgressInstrument | null
  /** All 12 pitch classes (0 = C), practised or not. */
  pitchClasses: (ItemFigures & { pitchClass: number })[]
  /** Every practised pitch (MIDI number). */
  pitches: (ItemFigures & { pitch: number })[]
  /** Per string (0 = lowest), the 12 pitch classes. */
  byString: { string: number; pitchClasses: (ItemFigures & { pitchClass: number })[] }[]
}

export interface TimelinePoint {
  day: string
  attempts: number
  correct: number
  accuracy: number
  /** Median and 90th percentile of that day's right answers (ms); null on a day without one. */
  medianMs: number | null
  p90Ms: number | null
  minutes: number
}

export interface TimelineAnswer {
  timeZone: string
  from: string
  to: string
  series: { drill: DrillId | 'all'; points: TimelinePoint[] }[]
}

export interface Streak {
  /** Days in a row with practice, ending today (or yesterday, when today has none yet). */
  current: number
  longest: number
  practisedToday: boolean
}

export interface PracticeTotals {
  attempts: number
  correct: number
  accuracy: number | null
  minutes: number
  days: number
  sessions: number
}

export interface SummaryAnswer {
  studentId: string
  timeZone: string
  today: string
  range: { from: string | null; to: string | null }
  totals: PracticeTotals
  todayTotals: PracticeTotals
  last7Days: PracticeTotals
  streak: Streak
  lastPracticeAt: string | null
  instruments: ProgressInstrument[]
  activeInstrumentId: string | null
}

export interface FingeringsAnswer {
  patterns: { pattern: string; sessions: number; attempts: number; lastPractisedAt: string }[]
}

/** One student of a teacher's roster (see server/progress/roster-service.ts for the meaning of each field). */
export interface RosterStudent {
  studentId: string
  name: string
  email: string
  studios: { id: string; name: string }[]
  lastPracticeAt: string | null
  attempts7d: number
  minutes7d: number
  accuracy7d: number | null
  medianRecallMs7d: number | null
  medianRecallMsPrev7d: number | null
  recallTrend: { change: number | null; direction: 'faster' | 'slower' | 'steady' | null }
  weakestPositions: {
    instrumentId: string
    string: number
    /** "low E", "A": the string's name on that instrument */
    stringName: string
    fret: number
    pitch: number
    answers: number
    accuracy: number
    medianMs: number | null
  }[]
}
