// A student's practice figures as the progress API answers them (own, or a teacher's view).
import type { DrillId } from './drills'

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
  /** Answers (right or wrong); "show me" is counted apart in `shown`. */
  attempts: number
  correct: number
  shown: number
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
  shown: number
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
  /** Answers shown on request ("show me"), not counted in attempts or accuracy. */
  shown: number
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
  /** Answers stored but not yet in these figures (the statistics are updating); absent means 0. */
  pending?: number
}

export interface FingeringsAnswer {
  patterns: { pattern: string; sessions: number; attempts: number; lastPractisedAt: string }[]
}

/** Chord Tones figures of one chord type, one degree, or one chord type × degree. */
export interface ChordToneFigures {
  attempts: number
  correct: number
  accuracy: number | null
  /** Median of the latest right answers' response times (ms; up to 50 per type × degree). */
  medianMs: number | null
  lastSeenAt: string | null
}

/** GET /api/progress/chords: Chord Tones answers per chord type, per degree and per both. */
export interface ChordTonesAnswer {
  instrumentId: string | null
  chordTypes: (ChordToneFigures & { chordType: string })[]
  degrees: (ChordToneFigures & { degree: string })[]
  cells: (ChordToneFigures & { chordType: string; degree: string })[]
}

/** The fastest clean tempo (BPM) of takes played on the instrument, per drill and settings, per day. */
export interface TemposAnswer {
  timeZone: string
  from: string
  to: string
  series: {
    drill: DrillId
    /** The settings in words ("C major, frets 2–5"). */
    settings: string
    /** The fastest over the whole range. */
    fastest: number
    points: { day: string; bpm: number }[]
  }[]
}
