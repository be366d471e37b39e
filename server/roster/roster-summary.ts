// The practice figures of a teacher's roster: one entry per student of their studios, from the
// statistics rollups (roster-service.ts adds plans and a status to build the roster rows).
//
// rosterSummary(ctx, teacherId) → { students: RosterStudent[] }, sorted by name, where
//   RosterStudent = {
//     studentId, name, email, studios: [{ id, name }],
//     lastPracticeAt: ISO string | null,
//     attempts7d, minutes7d,            // last 7 days in the student's time zone (today included)
//     accuracy7d: 0..1 | null,          // right answers / answers, last 7 days
//     attemptsPrev7d, accuracyPrev7d,   // the same for the 7 days before
//     instrument: { name, description, leftHanded } | null, // the active instrument
//     medianRecallMs7d: number | null,  // median response time of right answers, last 7 days
//     medianRecallMsPrev7d: number | null, // the same for the 7 days before
//     recallTrend: { change: number | null, direction: 'faster' | 'slower' | 'steady' | null },
//                                        // change = this week's median / last week's − 1 (−0.1 = 10 % faster)
//     weakestPositions: [{ instrumentId, string, stringName, pitchName, fret, pitch, answers, accuracy,
//                          medianMs }] // ≤ 3, by src/contract/weak-places.ts: places with a recent miss,
//                                        // worst first (latest 50 answers per place)
//     fastestTempo: { bpm, drill, settings } | null, // fastest clean played take, last 7 days
//   }
import { pitchClassName, pitchName, stringNames } from '../../src/theory'
import { compareWeakPlaces } from '../../src/contract/weak-places'
import { teacherStudents, type TeacherStudent } from '../access/access-repository'
import { practiceWindow } from '../access/shared-history'
import { timeZonesOf } from '../users/users-repository'
import type { AppContext } from '../context'
import {
  activeInstruments,
  fastestTempos,
  weakestPlaces,
  weakestPlacesSince,
  weekFigures,
  type FastestTempoRow,
  type WeakRow,
  type WeekRow,
} from './roster-repository'
import type { FastestTempo, RosterInstrument } from '../../src/contract/roster'
import { instrumentOf } from './roster-instrument'

/** One student of a teacher's roster (the meaning of each field is above). */
export interface RosterStudent {
  studentId: string
  name: string
  email: string
  studios: { id: string; name: string }[]
  lastPracticeAt: string | null
  attempts7d: number
  minutes7d: number
  accuracy7d: number | null
  attemptsPrev7d: number
  accuracyPrev7d: number | null
  instrument: RosterInstrument | null
  fastestTempo: FastestTempo | null
  medianRecallMs7d: number | null
  medianRecallMsPrev7d: number | null
  recallTrend: { change: number | null; direction: 'faster' | 'slower' | 'steady' | null }
  /** The first instant of practice the teacher may see (ISO; null: all of it). */
  sharesFrom: string | null
  weakestPositions: {
    instrumentId: string
    string: number
    /** "low E", "A": the string's name on that instrument */
    stringName: string
    /** "F#4" or "Gb4": spelled as the student's instrument spells notes (as the heat map does) */
    pitchName: string
    fret: number
    pitch: number
    answers: number
    accuracy: number
    medianMs: number | null
  }[]
}

/** Below this relative change in median recall time the trend is "steady". */
export const TREND_THRESHOLD = 0.05
const WEAKEST_COUNT = 3

export function recallTrend(
  now: number | null,
  before: number | null,
): RosterStudent['recallTrend'] {
  if (now === null || before === null || before <= 0) return { change: null, direction: null }
  const change = now / before - 1
  const direction =
    change <= -TREND_THRESHOLD ? 'faster' : change >= TREND_THRESHOLD ? 'slower' : 'steady'
  return { change: Math.round(change * 1000) / 1000, direction }
}

function weekPart(w: WeekRow | undefined) {
  const attempts = Number(w?.attempts7d ?? 0)
  const before = Number(w?.attempts_prev7d ?? 0)
  return {
    attemptsPrev7d: before,
    accuracyPrev7d: before > 0 ? Number(w?.correct_prev7d ?? 0) / before : null,
    lastPracticeAt: w?.last_at ? w.last_at.toISOString() : null,
    attempts7d: attempts,
    minutes7d: Math.round(Number(w?.active_ms7d ?? 0) / 6000) / 10,
    accuracy7d: attempts > 0 ? Number(w?.correct7d ?? 0) / attempts : null,
    medianRecallMs7d: w?.median7d ?? null,
    medianRecallMsPrev7d: w?.median_prev7d ?? null,
    recallTrend: recallTrend(w?.median7d ?? null, w?.median_prev7d ?? null),
  }
}

/** "low E", "A": the string's name on its instrument, told apart from a twin (see stringNames). */
function stringNameOf(r: WeakRow): string {
  const open = r.pitch - r.fret
  try {
    if (r.tuning)
      return (
        stringNames(r.tuning.map(Number), r.accidentals ?? 'flat')[r.string] ??
        pitchClassName(open, 'flat')
      )
  } catch {
    // a tuning the theory core refuses: fall through to the open string's note
  }
  return pitchClassName(open, 'flat')
}

const toWeak = (r: WeakRow) => ({
  instrumentId: r.instrument_key,
  string: r.string,
  stringName: stringNameOf(r),
  pitchName: pitchName(r.pitch, r.accidentals ?? 'flat'),
  fret: r.fret,
  pitch: r.pitch,
  answers: r.answers,
  accuracy: r.recent_accuracy,
  medianMs: r.recent_median_ms,
})

const tempoPart = (t: FastestTempoRow | undefined): FastestTempo | null =>
  t ? { bpm: Number(t.bpm), drill: t.drill, settings: t.settings } : null

/** The weakest places of every student: from the rollups, or from the answers a student shared. */
async function weakestOf(ctx: AppContext, members: TeacherStudent[], ids: string[]) {
  const windowed = members.flatMap((m) => (m.since ? [{ id: m.id, since: m.since }] : []))
  const whole = ids.filter((id) => !windowed.some((w) => w.id === id))
  const [fromRollups, fromAnswers] = await Promise.all([
    whole.length ? weakestPlaces(ctx.db, whole, WEAKEST_COUNT) : [],
    weakestPlacesSince(ctx.db, windowed, WEAKEST_COUNT),
  ])
  return [...fromRollups, ...fromAnswers]
}

/** Every student of the teacher's studios with their week in figures (see the shape above). */
export async function rosterSummary(
  ctx: AppContext,
  teacherId: string,
): Promise<{ students: RosterStudent[] }> {
  const members = await teacherStudents(ctx.db, teacherId)
  if (!members.length) return { students: [] }
  const ids = members.map((m) => m.id)
  await ctx.statistics.settle(ids) // answers still queued count in the figures read next
  const zones = await timeZonesOf(ctx.db, ids)
  const windows = members.map((m) => practiceWindow(m.since, zones.get(m.id) ?? 'UTC'))
  const [weeks, weak, instruments, tempos] = await Promise.all([
    weekFigures(
      ctx.db,
      ids,
      windows.map((w) => w.fromDay),
    ),
    weakestOf(ctx, members, ids),
    activeInstruments(ctx.db, ids),
    fastestTempos(
      ctx.db,
      ids,
      members.map((m) => m.since),
    ),
  ])
  const tempoOf = new Map(tempos.map((t) => [t.user_id, t]))
  const weekOf = new Map(weeks.map((w) => [w.user_id, w]))
  const instrumentRow = new Map(instruments.map((i) => [i.user_id, i]))
  return {
    students: members.map((m) => ({
      studentId: m.id,
      name: m.name,
      email: m.email,
      studios: m.studios,
      sharesFrom: m.since?.toISOString() ?? null,
      ...weekPart(weekOf.get(m.id)),
      instrument: instrumentOf(instrumentRow.get(m.id)),
      fastestTempo: tempoPart(tempoOf.get(m.id)),
      weakestPositions: weak
        .filter((w) => w.user_id === m.id)
        .map(toWeak)
        .sort((a, b) =>
          compareWeakPlaces(
            { ...a, recentAnswers: a.answers, recentAccuracy: a.accuracy },
            { ...b, recentAnswers: b.answers, recentAccuracy: b.accuracy },
          ),
        ),
    })),
  }
}
