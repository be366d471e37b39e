// Moving review cards for newly stored answers, a whole statistics drain at once: the answers are
// grouped by player and instrument, their cards read in one query, moved in order, written in one.
import type { Knex } from 'knex'
import { NO_INSTRUMENT } from '../progress/progress-repository'
import { cardsOfGroups, groupKey, type CardGroup } from './card-batch-repository'
import { cellKey, saveCardGroups, type CellAnswer } from './focus-repository'
import { applyAnswers } from './focus-service'

/** The fields of a stored attempt that move its place's review card. */
export interface ReviewedAnswer {
  user_id: string
  instrument_id: string | null
  string: number | null
  fret: number | null
  correct: boolean
  response_ms: number
  created_at: Date
}

interface AnswerGroup extends CardGroup {
  answers: CellAnswer[]
}

/** Placed answers by player and instrument, each group's answers oldest first. */
function groupAnswers(rows: ReviewedAnswer[]): AnswerGroup[] {
  const groups = new Map<string, AnswerGroup>()
  for (const r of rows) {
    if (r.string === null || r.fret === null) continue
    const instrumentKey = r.instrument_id ?? NO_INSTRUMENT
    const key = groupKey(r.user_id, instrumentKey)
    const group = groups.get(key) ?? { userId: r.user_id, instrumentKey, cells: [], answers: [] }
    groups.set(key, group)
    group.answers.push({
      string: r.string,
      fret: r.fret,
      correct: r.correct,
      responseMs: r.response_ms,
      at: r.created_at,
    })
  }
  for (const g of groups.values()) {
    g.answers.sort((a, b) => a.at.getTime() - b.at.getTime())
    const cells = new Map(g.answers.map((a) => [cellKey(a.string, a.fret), [a.string, a.fret]]))
    g.cells = [...cells.values()] as [number, number][]
  }
  return [...groups.values()]
}

/** Moves the cards of newly stored attempts (the statistics drain calls it in its transaction). */
export async function reviewStoredAnswers(trx: Knex.Transaction, rows: ReviewedAnswer[]) {
  const groups = groupAnswers(rows)
  if (!groups.length) return
  const stored = await cardsOfGroups(trx, groups)
  const moved = groups.map((g) => {
    const { cards, usual } = stored.get(groupKey(g.userId, g.instrumentKey)) ?? {
      cards: new Map(),
      usual: null,
    }
    return { ...g, cards: applyAnswers(cards, g.answers, usual) }
  })
  await saveCardGroups(trx, moved)
}
