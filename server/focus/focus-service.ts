// Focus use cases: the next questions for a drill (weak places first, with reasons), and keeping
// every place's spaced-review card current as attempts arrive.
import { randomInt } from 'node:crypto'
import { drillContract } from '../../src/contract/drills'
import { createRandom } from '../../src/theory'
import type { AppContext } from '../context'
import { badRequest, type FieldErrors } from '../lib/errors'
import { listInstruments } from '../instruments/instruments-repository'
import type { Instrument } from '../../src/contract/instruments'
import { ALL_DRILLS, itemRows, type ItemRow } from '../progress/progress-repository'
import type { PublicUser } from '../users/users-schema'
import { reviewCard } from './focus-cards'
import { rankKeys, rankRegions } from './focus-keys'
import {
  cellKey,
  latestCellAnswers,
  loadCards,
  saveCards,
  usualMs,
  type CellAnswer,
  type PlacedCard,
} from './focus-repository'
import type { FocusAnswer } from '../../src/contract/focus'
import type { FocusQuery } from './focus-schema'
import { scoreAll, selectFocus } from './focus-selector'
import type { FocusCandidate, FocusPick, ReviewCard } from './focus-types'

/** How many past answers rebuild the cards of attempts stored without them (seeded history). */
const REBUILD_LIMIT = 5000

/** Applies answers (oldest first) to the cards they concern; returns the changed cards. */
export function applyAnswers(
  cards: Map<string, ReviewCard>,
  answers: CellAnswer[],
  usual: number | null,
): PlacedCard[] {
  const changed = new Map<string, PlacedCard>()
  for (const a of answers) {
    const key = cellKey(a.string, a.fret)
    const card = reviewCard(cards.get(key) ?? null, a, usual)
    cards.set(key, card)
    changed.set(key, { string: a.string, fret: a.fret, card })
  }
  return [...changed.values()]
}

/** Cards of an instrument; rebuilt from past answers when history exists without cards. */
async function cardsOf(
  ctx: AppContext,
  userId: string,
  instrumentId: string,
  history: ItemRow[],
  cards: Map<string, ReviewCard>,
) {
  if (cards.size || !history.length) return cards
  const answers = await latestCellAnswers(ctx.db, userId, instrumentId, REBUILD_LIMIT)
  await saveCards(
    ctx.db,
    userId,
    instrumentId,
    applyAnswers(cards, answers, await usualMs(ctx.db, userId, instrumentId)),
  )
  return cards
}

async function ownInstrument(
  ctx: AppContext,
  userId: string,
  id: string | undefined,
): Promise<Instrument> {
  const list = await listInstruments(ctx.db, userId)
  const found = id ? list.find((i) => i.id === id) : (list.find((i) => i.isActive) ?? list[0])
  if (found) return found
  if (id)
    throw badRequest('Some fields need attention.', {
      'query.instrument': ['This is not one of your instruments.'],
    })
  throw badRequest('Set up an instrument first (Account → Instruments).')
}

/** The region asked for, checked against the instrument (whole neck by default). */
function regionOf(q: FocusQuery, instrument: Instrument) {
  const region = {
    lowString: q.lowString ?? 0,
    highString: q.highString ?? instrument.tuning.length - 1,
    lowFret: q.lowFret ?? 0,
    highFret: q.highFret ?? instrument.frets,
  }
  const fields: FieldErrors = {}
  if (region.highString >= instrument.tuning.length)
    fields['query.highString'] = [
      `This instrument has ${instrument.tuning.length} strings (0 to ${instrument.tuning.length - 1}).`,
    ]
  if (region.lowString >= instrument.tuning.length)
    fields['query.lowString'] = [
      `This instrument has ${instrument.tuning.length} strings (0 to ${instrument.tuning.length - 1}).`,
    ]
  if (region.highFret > instrument.frets)
    fields['query.highFret'] = [`This instrument has ${instrument.frets} frets.`]
  if (region.lowFret > instrument.frets)
    fields['query.lowFret'] = [`This instrument has ${instrument.frets} frets.`]
  if (Object.keys(fields).length) throw badRequest('Some fields need attention.', fields)
  return region
}

/** Every place of the region with what is known about it at its current pitch. */
function candidatesOf(
  instrument: Instrument,
  region: ReturnType<typeof regionOf>,
  history: ItemRow[],
  cards: Map<string, ReviewCard>,
): FocusCandidate[] {
  const byPlace = new Map(history.map((r) => [`${r.string}:${r.fret}:${r.pitch}`, r]))
  const candidates: FocusCandidate[] = []
  for (let string = region.lowString; string <= region.highString; string++) {
    for (let fret = region.lowFret; fret <= region.highFret; fret++) {
      const pitch = (instrument.tuning[string] ?? 0) + fret
      const row = byPlace.get(`${string}:${fret}:${pitch}`)
      candidates.push({
        string,
        fret,
        pitch,
        attempts: row?.attempts ?? 0,
        recentCorrect: row?.recentCorrect ?? [],
        recentMs: row?.recentMs ?? [],
        lastSeenAt: row?.lastAt ?? null,
        card: cards.get(cellKey(string, fret)) ?? null,
      })
    }
  }
  return candidates
}

const toItem = (p: FocusPick) => ({ ...p, due: p.due ? p.due.toISOString() : null })

/** The next questions for a drill on the player's instrument (see GET /api/focus). */
export async function focusFor(
  ctx: AppContext,
  user: PublicUser,
  q: FocusQuery,
): Promise<FocusAnswer> {
  const instrument = await ownInstrument(ctx, user.id, q.instrument)
  const region = regionOf(q, instrument)
  const pending = await ctx.statistics.settle([user.id])
  const [history, stored] = await Promise.all([
    itemRows(ctx.db, user.id, instrument.id, ALL_DRILLS),
    loadCards(ctx.db, user.id, instrument.id),
  ])
  const cards = await cardsOf(ctx, user.id, instrument.id, history, stored)
  const candidates = candidatesOf(instrument, region, history, cards)
  const now = new Date()
  const random = createRandom(q.seed ?? randomInt(2 ** 32 - 1))
  const answer: FocusAnswer = {
    instrumentId: instrument.id,
    drill: q.drill,
    items: selectFocus(candidates, { n: q.n, now, random }).map(toItem),
    pending,
  }
  const extras = drillContract(q.drill).focus
  if (!extras.keys && !extras.regions) return answer
  const scored = scoreAll(candidates, now)
  if (extras.keys) answer.keys = rankKeys(scored, q.scale)
  if (extras.regions) answer.regions = rankRegions(scored, region.lowFret, region.highFret)
  return answer
}
