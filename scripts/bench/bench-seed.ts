// Seeding for the database benchmarks: players, an instrument each, and practice histories generated
// inside PostgreSQL (multi-row INSERT … SELECT over generate_series, seeded with setseed), so millions
// of attempts need no client round trips. The statistics drain rolls each history up after it is
// inserted (in larger batches than the server's), through the same SQL and card code as in production.
import type { Db } from '../../server/lib/db'
import { drainAll } from '../../server/statistics/rollup-drain'

export const BASS = [28, 33, 38, 43]
/** Answers per drain after a bulk insert. */
const BULK_DRAIN = 25_000
const NOT_A_PASSWORD = '!bench-user-cannot-sign-in-with-a-password'

export async function createPlayer(db: Db, role: 'student' | 'teacher', label: string) {
  const [user] = await db('users')
    .insert({ email: `${label}@bench.test`, name: label, role, password_hash: NOT_A_PASSWORD })
    .returning('id')
  return (user as { id: string }).id
}

export async function createBass(db: Db, userId: string) {
  const [row] = await db('instruments')
    .insert({
      user_id: userId,
      name: '4-string bass',
      tuning: BASS,
      frets: 24,
      scale_length_mm: 864,
      is_active: true,
    })
    .returning('id')
  return (row as { id: string }).id
}

export interface History {
  userId: string
  instrumentId: string
  attempts: number
  days: number
  sessionsPerDay: number
  /** 0..1, makes the history reproducible. */
  seed: number
}

// One chunk of a history: answers g ∈ [from, to) spread evenly over the days, sessions 5 h apart
// from 08:00, one answer every 4 s; 85 % right in 0.7–3.3 s; drills mixed; Range Runs with patterns.
const CHUNK_SQL = `
insert into attempts (id, user_id, instrument_id, tuning, drill, session_id, string, fret, expected_pitch,
  answer, correct, response_ms, created_at, detail)
select gen_random_uuid(), :user, :instrument, '{28,33,38,43}'::smallint[], r.drill,
  md5(:user || ':' || (r.g / :perSession))::uuid, r.s, r.f, (array[28,33,38,43])[r.s + 1] + r.f,
  'x', r.correct, r.ms,
  :start::timestamptz + (r.g / :perDay) * interval '1 day' + ((r.g % :perDay) / :perSession) * interval '5 hours'
    + interval '8 hours' + ((r.g % :perSession) * 4) * interval '1 second',
  case when r.drill = 'runs' then jsonb_build_object('tonic', 'G', 'scale', 'major', 'lowFret', 2, 'highFret', 5,
    'pattern', (array['3-3-3-3', '4-4-3-2', '2-3-3-4'])[1 + r.g % 3], 'direction', 'up') else '{}'::jsonb end
from (
  select g, floor(random() * 4)::int as s, floor(random() * 21)::int as f, random() < 0.85 as correct,
    (700 + random() * 2600)::int as ms,
    (array['recall', 'recall', 'recall', 'hunt', 'hunt', 'runs', 'scatter', 'cycle'])[1 + floor(random() * 8)::int] as drill
  from generate_series(:from::int, :to::int - 1) as g
) r`

/** Inserts a history ending today, in chunks of about a month. */
export async function seedHistory(db: Db, h: History) {
  const perDay = Math.ceil(h.attempts / h.days)
  const perSession = Math.ceil(perDay / h.sessionsPerDay)
  const start = new Date(Date.now() - (h.days + 1) * 86_400_000)
  start.setUTCHours(0, 0, 0, 0)
  const chunk = Math.max(perDay * 30, 25_000)
  await db.transaction(async (trx) => {
    await trx.raw('select setseed(?)', [h.seed])
    for (let from = 0; from < h.attempts; from += chunk) {
      const to = Math.min(h.attempts, from + chunk)
      await trx.raw(CHUNK_SQL, {
        user: h.userId,
        instrument: h.instrumentId,
        perSession,
        perDay,
        start: start.toISOString(),
        from,
        to,
      } as never)
    }
  })
  await drainAll(db, BULK_DRAIN)
}
