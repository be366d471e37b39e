// Review cards for a whole statistics drain at once: one read of the cards and usual times of every
// player and instrument in the drain (written back together by saveCardGroups, focus-repository).
import type { Knex } from 'knex'
import { ALL_DRILLS } from '../progress/progress-repository'
import { cardFromJson, cellKey, USUAL_MS_SQL, type CardJson } from './focus-repository'
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
       ${USUAL_MS_SQL('g.user_id', 'g.instrument_key')} as usual,
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
  cards: new Map(r.cards.map((c) => [cellKey(c.string, c.fret), cardFromJson(c)])),
})
