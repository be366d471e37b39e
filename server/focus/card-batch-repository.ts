// Review cards for a whole statistics drain at once: one read of the cards and usual times of every
// player and instrument in the drain, one upsert of every card it moved (not two queries per player).
import type { Knex } from 'knex'
import { ALL_DRILLS } from '../progress/progress-repository'
import { cardFromJson, type CardJson, type PlacedCard } from './focus-repository'
import type { ReviewCard } from './focus-types'

/** A player's instrument ("user/instrument_key") in a drain, and the places its answers name. */
export interface CardGroup {
  userId: string
  instrumentKey: string
  cells: [number, number][]
}

export interface GroupCards {
  usual: number | null
  cards: Map<string, ReviewCard>
}

export const groupKey = (userId: string, instrumentKey: string) => `${userId}/${instrumentKey}`

/** The cards of the named places and the usual time of every group, in one round trip. */
export async function cardsOfGroups(trx: Knex.Transaction, groups: CardGroup[]) {
  const cells = groups.flatMap((g) =>
    g.cells.map(([string, fret]) => ({
      user_id: g.userId,
      instrument_key: g.instrumentKey,
      string,
      fret,
    })),
  )
  const { rows } = await trx.raw<{
    rows: { user_id: string; instrument_key: string; usual: number | null; cards: CardJson[] }[]
  }>(
    `with cell as (
       select * from json_to_recordset(:cells::json)
         as x(user_id uuid, instrument_key uuid, string smallint, fret smallint)),
     grp as (select distinct user_id, instrument_key from cell)
     select g.user_id, g.instrument_key,
       (select percentile_cont(0.5) within group (order by p.recent_median_ms) from progress_items p
         where p.user_id = g.user_id and p.instrument_key = g.instrument_key and p.drill = :all
           and p.string >= 0 and p.recent_median_ms is not null) as usual,
       coalesce((select json_agg(c) from focus_cards c
         join cell x on x.user_id = c.user_id and x.instrument_key = c.instrument_key
           and x.string = c.string and x.fret = c.fret
         where c.user_id = g.user_id and c.instrument_key = g.instrument_key), '[]') as cards
     from grp g`,
    { cells: JSON.stringify(cells), all: ALL_DRILLS },
  )
  return new Map<string, GroupCards>(
    rows.map((r) => [groupKey(r.user_id, r.instrument_key), cardsAndUsualOf(r)]),
  )
}

const cardsAndUsualOf = (r: { usual: number | null; cards: CardJson[] }): GroupCards => ({
  usual: r.usual,
  cards: new Map(r.cards.map((c) => [`${c.string}:${c.fret}`, cardFromJson(c)])),
})

/** Writes the moved cards of every group (insert or replace) in one statement. */
export async function saveGroupCards(
  trx: Knex.Transaction,
  moved: { userId: string; instrumentKey: string; cards: PlacedCard[] }[],
) {
  const rows = moved.flatMap(({ userId, instrumentKey, cards }) =>
    cards.map(({ string, fret, card: c }) => ({
      user_id: userId,
      instrument_key: instrumentKey,
      string,
      fret,
      due: c.due,
      stability: c.stability,
      difficulty: c.difficulty,
      elapsed_days: c.elapsedDays,
      scheduled_days: c.scheduledDays,
      learning_steps: c.learningSteps,
      reps: c.reps,
      lapses: c.lapses,
      state: c.state,
      last_review: c.lastReview,
      recent_misses: c.recentMisses,
    })),
  )
  if (!rows.length) return
  const columns = Object.keys(rows[0]!)
  const updates = columns.slice(4).map((c) => `${c} = excluded.${c}`)
  await trx.raw(
    `insert into focus_cards (${columns.join(', ')})
     select ${columns.join(', ')} from json_populate_recordset(null::focus_cards, ?::json)
     on conflict (user_id, instrument_key, string, fret) do update set ${updates.join(', ')}`,
    [JSON.stringify(rows)],
  )
}
