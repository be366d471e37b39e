// Progress use cases: summary, places, notes, timeline and fingerings of one student, read from the
// rollups. Own data by default; teachers and admins pass `student` and are checked first.
import { practiceWindow, readableSince, type PracticeWindow } from '../access/shared-history'
import type { AppContext } from '../context'
import { badRequest } from '../lib/errors'
import { listInstruments } from '../instruments/instruments-repository'
import type { PublicUser } from '../users/users-schema'
import type { DrillId } from '../../src/contract/drills'
import {
  addDays,
  localDay,
  pitchClassFigures,
  pitchFigures,
  positionsFrom,
  streakOf,
  stringFigures,
  toPoint,
  totalsOf,
} from './progress-stats'
import * as repo from './progress-repository'
import { chordToneRowsSince, itemRowsSince } from './window-repository'
import { lastCycleStop } from './cycle-stop-repository'
import type { CyclePositionAnswer } from '../../src/contract/drills'
import type {
  ChordTonesAnswer,
  FingeringsAnswer,
  TemposAnswer,
  NotesAnswer,
  PositionsAnswer,
  ProgressInstrument,
  SummaryAnswer,
  TimelineAnswer,
} from '../../src/contract/progress'
import type {
  ChordTonesQuery,
  CyclePositionQuery,
  FingeringsQuery,
  ProgressScope,
  RangeQuery,
} from './progress-schema'
import { chordToneFigures } from './chord-tone-stats'

const { ALL_DRILLS, ALL_INSTRUMENTS } = repo
const DEFAULT_TIMELINE_DAYS = 30

/**
 * The student whose data is asked for, after checking the viewer may read it, with their answers
 * still queued for the statistics rolled up first; `pending` counts any still waiting.
 */
async function settledStudent(ctx: AppContext, viewer: PublicUser, student?: string) {
  const studentId = student ?? viewer.id
  const since = await readableSince(ctx, viewer, studentId)
  return { studentId, since, pending: await ctx.statistics.settle([studentId]) }
}

/** The student whose data is asked for (see settledStudent) and from when on the viewer sees it. */
export async function readableStudent(ctx: AppContext, viewer: PublicUser, student?: string) {
  const { studentId, since } = await settledStudent(ctx, viewer, student)
  return { studentId, since }
}

/** A day range cut to the days the viewer sees wholly (the rollups count whole local days). */
function visibleRange(window: PracticeWindow, from?: string, to?: string) {
  const start = window.fromDay && (!from || from < window.fromDay) ? window.fromDay : from
  return { from: start, to, since: window.since ?? undefined }
}

async function instrumentsOf(ctx: AppContext, studentId: string): Promise<ProgressInstrument[]> {
  const list = await listInstruments(ctx.db, studentId)
  return list.map(
    ({ id, name, tuning, frets, scaleLengthMm, handedness, accidentals, isActive }) => ({
      id,
      name,
      tuning,
      frets,
      scaleLengthMm,
      handedness,
      accidentals,
      isActive,
    }),
  )
}

/** The requested instrument (must be the student's), else null when `fallback` is false. */
function pickInstrument(
  list: ProgressInstrument[],
  requested: string | undefined,
  fallback: boolean,
) {
  if (requested) {
    const found = list.find((i) => i.id === requested)
    if (!found)
      throw badRequest('Some fields need attention.', {
        'query.instrument': ['This is not one of the student’s instruments.'],
      })
    return found
  }
  return fallback ? (list.find((i) => i.isActive) ?? list[0] ?? null) : null
}

/** Whose figures, their instruments and time zone, and the instrument key a range query reads. */
async function rangeScope(ctx: AppContext, viewer: PublicUser, q: RangeQuery) {
  const { studentId, since, pending } = await settledStudent(ctx, viewer, q.student)
  const [instruments, timeZone] = await Promise.all([
    instrumentsOf(ctx, studentId),
    repo.timeZoneOf(ctx.db, studentId),
  ])
  const key = pickInstrument(instruments, q.instrument, false)?.id ?? ALL_INSTRUMENTS
  const window = practiceWindow(since, timeZone)
  return { studentId, instruments, timeZone, key, pending, window }
}

/** Summary: totals in the range (all time by default), today, the last 7 days, and the streak. */
export async function summary(
  ctx: AppContext,
  viewer: PublicUser,
  q: RangeQuery,
): Promise<SummaryAnswer> {
  const { studentId, instruments, timeZone, key, pending, window } = await rangeScope(
    ctx,
    viewer,
    q,
  )
  const drill = q.drill ?? ALL_DRILLS
  const today = localDay(new Date(), timeZone)
  const weekStart = addDays(today, -6)
  const sessions = (from?: string, to?: string) =>
    repo.sessionCount(ctx.db, studentId, key, drill, visibleRange(window, from, to))
  const [days, inRange, onToday, inWeek] = await Promise.all([
    repo.dayRows(ctx.db, studentId, key, [drill], visibleRange(window)),
    sessions(q.from, q.to),
    sessions(today, today),
    sessions(weekStart, today),
  ])
  const allDays = days.filter((d) => d.day <= today)
  const within = (from?: string, to?: string) =>
    allDays.filter((d) => (!from || d.day >= from) && (!to || d.day <= to))
  const last = allDays.at(-1)
  return {
    studentId,
    timeZone,
    today,
    range: { from: q.from ?? null, to: q.to ?? null },
    totals: totalsOf(within(q.from, q.to), inRange),
    todayTotals: totalsOf(within(today, today), onToday),
    last7Days: totalsOf(within(weekStart, today), inWeek),
    streak: streakOf(
      allDays.map((d) => d.day),
      today,
    ),
    lastPracticeAt: last ? last.lastAt.toISOString() : null,
    instruments,
    activeInstrumentId: instruments.find((i) => i.isActive)?.id ?? null,
    pending,
  }
}

async function itemScope(ctx: AppContext, viewer: PublicUser, q: ProgressScope) {
  const { studentId, since } = await readableStudent(ctx, viewer, q.student)
  const instrument = pickInstrument(await instrumentsOf(ctx, studentId), q.instrument, true)
  const drill = q.drill ?? ALL_DRILLS
  if (!instrument) return { instrument, rows: [] }
  const rows = since
    ? await itemRowsSince(ctx.db, studentId, instrument.id, drill, since)
    : await repo.itemRows(ctx.db, studentId, instrument.id, drill)
  return { instrument, rows }
}

/** Figures per fretboard place of one instrument (the active one by default). */
export async function positions(
  ctx: AppContext,
  viewer: PublicUser,
  q: ProgressScope,
): Promise<PositionsAnswer> {
  const { instrument, rows } = await itemScope(ctx, viewer, q)
  return { instrument, positions: positionsFrom(rows) }
}

/** Figures per pitch class, per pitch and per string × pitch class of one instrument. */
export async function notes(
  ctx: AppContext,
  viewer: PublicUser,
  q: ProgressScope,
): Promise<NotesAnswer> {
  const { instrument, rows } = await itemScope(ctx, viewer, q)
  return {
    instrument,
    pitchClasses: pitchClassFigures(rows),
    pitches: pitchFigures(rows),
    byString: stringFigures(rows, instrument?.tuning.length ?? 0),
  }
}

/** Per-day points for all drills together and for each drill (last 30 days by default). */
export async function timeline(
  ctx: AppContext,
  viewer: PublicUser,
  q: RangeQuery,
): Promise<TimelineAnswer> {
  const { studentId, timeZone, key, window } = await rangeScope(ctx, viewer, q)
  const to = q.to ?? localDay(new Date(), timeZone)
  const from = q.from ?? addDays(to, -(DEFAULT_TIMELINE_DAYS - 1))
  const range = visibleRange(window, from, to)
  const rows = await repo.dayRows(ctx.db, studentId, key, q.drill ? [q.drill] : null, range)
  const drills = [...new Set(rows.map((r) => r.drill))].sort((a, b) =>
    a === ALL_DRILLS ? -1 : b === ALL_DRILLS ? 1 : a.localeCompare(b),
  )
  const series = drills.map((drill) => ({
    drill: (drill === ALL_DRILLS ? 'all' : drill) as TimelineAnswer['series'][number]['drill'],
    // a day with only "show me" has no answers to chart
    points: rows.filter((r) => r.drill === drill && r.attempts > 0).map(toPoint),
  }))
  return { timeZone, from, to, series }
}

/** The readable student and the instrument asked for (null: none asked, every instrument). */
async function studentAndInstrument(
  ctx: AppContext,
  viewer: PublicUser,
  q: { student?: string; instrument?: string },
) {
  const { studentId, since } = await readableStudent(ctx, viewer, q.student)
  const instrument = q.instrument
    ? pickInstrument(await instrumentsOf(ctx, studentId), q.instrument, false)
    : null
  return { studentId, since, instrument }
}

/** How often each fingering pattern of a key and region was practised in Range Runs. */
export async function fingerings(
  ctx: AppContext,
  viewer: PublicUser,
  q: FingeringsQuery,
): Promise<FingeringsAnswer> {
  const { studentId, since, instrument } = await studentAndInstrument(ctx, viewer, q)
  const patterns = await repo.fingeringRows(ctx.db, studentId, {
    ...q,
    instrumentId: instrument?.id,
    since: since ?? undefined,
  })
  return { patterns }
}

/** Where the last Window Cycle session of a scale (of a plan item) stopped: its last note. */
export async function cyclePosition(
  ctx: AppContext,
  viewer: PublicUser,
  q: CyclePositionQuery,
): Promise<CyclePositionAnswer> {
  const { studentId, since } = await readableStudent(ctx, viewer, q.student)
  const row = await lastCycleStop(ctx.db, studentId, {
    scale: q.scale,
    planItemId: q.planItem ?? null,
    since,
  })
  return { stop: row && { ...row, at: row.at.toISOString() } }
}

/** Chord Tones answers per chord type and degree (every instrument unless one is asked for). */
export async function chordTones(
  ctx: AppContext,
  viewer: PublicUser,
  q: ChordTonesQuery,
): Promise<ChordTonesAnswer> {
  const { studentId, since, instrument } = await studentAndInstrument(ctx, viewer, q)
  const rows = since
    ? await chordToneRowsSince(ctx.db, studentId, since, instrument?.id)
    : await repo.chordToneRows(ctx.db, studentId, instrument?.id)
  return chordToneFigures(rows, instrument?.id ?? null)
}

/** The fastest clean tempo of takes played on the instrument, per drill and settings, per day. */
export async function tempos(
  ctx: AppContext,
  viewer: PublicUser,
  q: RangeQuery,
): Promise<TemposAnswer> {
  const { studentId, timeZone, key, window } = await rangeScope(ctx, viewer, q)
  const to = q.to ?? localDay(new Date(), timeZone)
  const from = q.from ?? addDays(to, -(DEFAULT_TIMELINE_DAYS - 1))
  const range = { from, to }
  const filter = {
    instrumentKey: key,
    drill: q.drill ?? null,
    timeZone,
    range,
    since: window.since,
  }
  const rows = await repo.tempoRows(ctx.db, studentId, filter)
  const series = new Map<string, TemposAnswer['series'][number]>()
  for (const { drill, settings, day, bpm } of rows) {
    const name = `${drill}\u0000${settings}`
    const line: TemposAnswer['series'][number] = series.get(name) ?? {
      ...{ drill: drill as DrillId, settings },
      ...{ fastest: 0, points: [] },
    }
    line.points.push({ day, bpm })
    line.fastest = Math.max(line.fastest, bpm)
    series.set(name, line)
  }
  return { timeZone, from, to, series: [...series.values()] }
}
