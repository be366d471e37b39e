// The statistics of one player two ways: as the rollups and review cards hold them, and recomputed
// from the raw attempts. Tests of the statistics queue compare the two (they must be equal).
import type { Knex } from 'knex'

const ALL_INSTRUMENTS = 'ffffffff-ffff-ffff-ffff-ffffffffffff'

/** Counts per place, per local day, per session and review count per place, from the rollups. */
export async function rolledUp(db: Knex, userId: string) {
  const [places, days, sessions, cards] = await Promise.all([
    db('progress_items')
      .where({ user_id: userId, drill: '*' })
      .select('instrument_key as key', 'string', 'fret', 'pitch', 'attempts', 'correct')
      .orderBy(['key', 'string', 'fret', 'pitch']),
    db('progress_days')
      .where({ user_id: userId, drill: '*', instrument_key: ALL_INSTRUMENTS })
      .select(db.raw('day::text as day'), 'attempts', 'correct')
      .orderBy('day'),
    db('progress_sessions')
      .where({ user_id: userId })
      .select('session_id', 'attempts')
      .orderBy('session_id'),
    db('focus_cards')
      .where({ user_id: userId })
      .select('instrument_key as key', 'string', 'fret', 'reps')
      .orderBy(['key', 'string', 'fret']),
  ])
  return { places, days, sessions, cards }
}

/** The same figures straight from the player's attempts (the time zone as stored for them). */
export async function recomputed(db: Knex, userId: string) {
  const q = async (sql: string) => (await db.raw(sql, { user: userId })).rows
  const key = `coalesce(instrument_id, '00000000-0000-0000-0000-000000000000'::uuid)`
  const [places, days, sessions, cards] = await Promise.all([
    q(`select ${key} as key, coalesce(string, -1) as string, coalesce(fret, -1) as fret,
         expected_pitch as pitch, count(*)::int as attempts, count(*) filter (where correct)::int as correct
       from attempts where user_id = :user group by 1, 2, 3, 4 order by 1, 2, 3, 4`),
    q(`select (a.created_at at time zone coalesce(z.time_zone, 'UTC'))::date::text as day,
         count(*)::int as attempts, count(*) filter (where correct)::int as correct
       from attempts a left join user_time_zones z on z.user_id = a.user_id
       where a.user_id = :user group by 1 order by 1`),
    q(`select session_id, count(*)::int as attempts from attempts where user_id = :user
       group by 1 order by 1`),
    q(`select ${key} as key, string, fret, count(*)::int as reps from attempts
       where user_id = :user and string is not null and fret is not null
       group by 1, 2, 3 order by 1, 2, 3`),
  ])
  return { places, days, sessions, cards }
}
