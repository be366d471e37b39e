// Roster figures for many students at once, from the rollups (one query per figure, not per student),
// and GET /api/studio/students (one row per membership, with last practice and overall accuracy).
import type { Db } from '../lib/db'
import type { StudioStudent } from '../../src/contract/roster'
import { ALL_DRILLS, ALL_INSTRUMENTS, NO_INSTRUMENT } from '../progress/progress-repository'
import { ITEMS_SINCE_SQL } from '../progress/window-repository'

export interface WeekRow {
  user_id: string
  attempts7d: string | null
  correct7d: string | null
  active_ms7d: string | null
  attempts_prev7d: string | null
  correct_prev7d: string | null
  median7d: number | null
  median_prev7d: number | null
  last_at: Date | null
}

/**
 * Per student: the last 7 local days and the 7 before (attempts, right answers, active time this
 * week; answers and right answers the week before; median recall of right answers), and the last
 * practice time — counting only days from each student's `fromDays` entry on (null: every day).
 */
export async function weekFigures(
  db: Db,
  studentIds: string[],
  fromDays: (string | null)[],
): Promise<WeekRow[]> {
  const { rows } = await db.raw(
    `with st as (
       select u.id as user_id, u.from_day,
         (now() at time zone coalesce(z.time_zone, 'UTC'))::date as today
       from unnest(?::uuid[], ?::date[]) as u(id, from_day)
       left join user_time_zones z on z.user_id = u.id
     ), d as (
       select d.user_id, d.attempts, d.correct, d.active_ms, d.recall_ms, d.day > st.today - 7 as this_week
       from progress_days d join st on st.user_id = d.user_id
       where d.instrument_key = ? and d.drill = ? and d.day > st.today - 14 and d.day <= st.today
         and d.day >= coalesce(st.from_day, '-infinity')
     ), sums as (
       select user_id, sum(attempts) filter (where this_week) as attempts7d,
         sum(correct) filter (where this_week) as correct7d, sum(active_ms) filter (where this_week) as active_ms7d,
         sum(attempts) filter (where not this_week) as attempts_prev7d,
         sum(correct) filter (where not this_week) as correct_prev7d
       from d group by user_id
     ), medians as (
       select d.user_id,
         percentile_cont(0.5) within group (order by v) filter (where d.this_week) as median7d,
         percentile_cont(0.5) within group (order by v) filter (where not d.this_week) as median_prev7d
       from d cross join lateral unnest(d.recall_ms) as v group by d.user_id
     )
     select st.user_id, sums.attempts7d, sums.correct7d, sums.active_ms7d, sums.attempts_prev7d,
       sums.correct_prev7d, medians.median7d, medians.median_prev7d,
       (select p.last_at from progress_days p where p.user_id = st.user_id and p.instrument_key = ?
          and p.drill = ? and p.day >= coalesce(st.from_day, '-infinity')
          order by p.day desc limit 1) as last_at
     from st left join sums using (user_id) left join medians using (user_id)`,
    // node-postgres sends a null entry of an array as SQL NULL
    [studentIds, fromDays as string[], ALL_INSTRUMENTS, ALL_DRILLS, ALL_INSTRUMENTS, ALL_DRILLS],
  )
  return rows
}

export interface WeakRow {
  user_id: string
  instrument_key: string
  string: number
  fret: number
  pitch: number
  answers: number
  recent_accuracy: number
  recent_median_ms: number | null
  /** The instrument's open strings and spelling, null when it has been deleted since. */
  tuning: number[] | null
  accidentals: 'sharp' | 'flat' | null
}

/**
 * Per student, the `limit` weakest places by the contract's rule (weak-places.ts: a recent miss;
 * lowest recent accuracy, then more answers, then slower), from the index on recent accuracy.
 */
export async function weakestPlaces(
  db: Db,
  studentIds: string[],
  limit: number,
): Promise<WeakRow[]> {
  const { rows } = await db.raw(
    `select s.id as user_id, w.*, ins.tuning, ins.accidentals from unnest(?::uuid[]) as s(id)
     cross join lateral (
       select i.instrument_key, i.string, i.fret, i.pitch, cardinality(i.recent_correct) as answers,
         i.recent_accuracy, i.recent_median_ms
       from progress_items i
       where i.user_id = s.id and i.drill = ? and i.string >= 0 and i.instrument_key <> ?
         and cardinality(i.recent_correct) > 0 and i.recent_accuracy < 1
       order by i.recent_accuracy, cardinality(i.recent_correct) desc,
         i.recent_median_ms desc nulls last, i.string, i.fret
       limit ?
     ) as w
     left join instruments ins on ins.id = w.instrument_key`,
    [studentIds, ALL_DRILLS, NO_INSTRUMENT, limit],
  )
  return rows
}

/** weakestPlaces for students who share practice from an instant on, from their answers since. */
export async function weakestPlacesSince(
  db: Db,
  students: { id: string; since: Date }[],
  limit: number,
): Promise<WeakRow[]> {
  if (!students.length) return []
  const { rows } = await db.raw(
    `with students as (
       select * from unnest(?::uuid[], ?::timestamptz[]) as s(id, since)
     ), items as (${ITEMS_SINCE_SQL})
     select s.id as user_id, w.*, ins.tuning, ins.accidentals from students s
     cross join lateral (
       select i.instrument_key, i.string, i.fret, i.pitch, cardinality(i.recent_correct) as answers,
         i.recent_accuracy, i.recent_median_ms
       from items i
       where i.user_id = s.id and i.string >= 0 and i.instrument_key <> ?
         and cardinality(i.recent_correct) > 0 and i.recent_accuracy < 1
       order by i.recent_accuracy, cardinality(i.recent_correct) desc,
         i.recent_median_ms desc nulls last, i.string, i.fret
       limit ?
     ) as w
     left join instruments ins on ins.id = w.instrument_key`,
    [students.map((s) => s.id), students.map((s) => s.since), '*', '*', NO_INSTRUMENT, limit],
  )
  return rows
}

export interface FastestTempoRow {
  user_id: string
  drill: string
  bpm: number
  settings: string | null
}

/**
 * Per student, the fastest clean tempo of a played take in the last 7 local days (any drill),
 * with its drill and settings; the later take wins a tie. Students without one have no row.
 */
export async function fastestTempos(
  db: Db,
  studentIds: string[],
  sinces: (Date | null)[],
): Promise<FastestTempoRow[]> {
  const { rows } = await db.raw(
    `with st as (
       select u.id as user_id, u.since, coalesce(z.time_zone, 'UTC') as tz,
         (now() at time zone coalesce(z.time_zone, 'UTC'))::date as today
       from unnest(?::uuid[], ?::timestamptz[]) as u(id, since)
       left join user_time_zones z on z.user_id = u.id
     )
     select distinct on (a.user_id) a.user_id, a.drill, (a.detail->>'cleanTempo')::int as bpm,
       a.detail->>'playedSettings' as settings
     from attempts a join st on st.user_id = a.user_id
     where a.detail->>'cleanTempo' is not null and a.created_at > now() - interval '8 days'
       and (a.created_at at time zone st.tz)::date > st.today - 7
       and a.created_at >= coalesce(st.since, '-infinity')
     order by a.user_id, bpm desc, a.created_at desc`,
    [studentIds, sinces as Date[]],
  )
  return rows
}

export interface ActiveInstrumentRow {
  user_id: string
  name: string
  preset_id: string | null
  tuning: number[]
  frets: number
  handedness: 'right' | 'left'
  accidentals: 'sharp' | 'flat'
}

/** Each student's active instrument (none for a student who has not set one up). */
export async function activeInstruments(
  db: Db,
  studentIds: string[],
): Promise<ActiveInstrumentRow[]> {
  return db('instruments')
    .whereIn('user_id', studentIds)
    .andWhere('is_active', true)
    .select('user_id', 'name', 'preset_id', 'tuning', 'frets', 'handedness', 'accidentals')
}

interface MembershipRow {
  id: string
  name: string
  email: string
  studio_id: string
  studio_name: string
  joined_at: Date
  last_practice_at: Date | null
  correct: string | null
  total: string | null
}

/** Every student in the teacher's studios, with last practice and overall accuracy. */
export async function listTeacherStudents(
  db: Db,
  teacherId: string,
): Promise<Omit<StudioStudent, 'instrument'>[]> {
  const rows: MembershipRow[] = await db('studios as s')
    .join('studio_members as m', 'm.studio_id', 's.id')
    .join('users as u', 'u.id', 'm.student_id')
    // each membership sees the practice its student shared with that studio (shares_from on)
    .joinRaw(
      `left join lateral (
         select max(created_at) as last_practice_at, count(*) as total, sum(correct::int) as correct
         from attempts where user_id = u.id and created_at >= coalesce(m.shares_from, '-infinity')
       ) as a on true`,
    )
    .where('s.teacher_id', teacherId)
    .select(
      'u.id',
      'u.name',
      'u.email',
      's.id as studio_id',
      's.name as studio_name',
      'm.joined_at',
    )
    .select('a.last_practice_at', 'a.correct', 'a.total')
    .orderBy('u.name')
  return rows.map((r) => ({
    id: r.id,
    name: r.name,
    email: r.email,
    studioId: r.studio_id,
    studioName: r.studio_name,
    joinedAt: r.joined_at.toISOString(),
    lastPracticeAt: r.last_practice_at ? r.last_practice_at.toISOString() : null,
    accuracy: r.total && Number(r.total) > 0 ? Number(r.correct) / Number(r.total) : null,
  }))
}
