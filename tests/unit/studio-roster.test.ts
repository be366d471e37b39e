// Roster rules: filtering, sorting and paging; the behind / inactive / on-track status; ISO weeks
// for the digest (source: ISO 8601 week dates; the dates are checked against a printed calendar).
import { describe, expect, it } from 'vitest'
import type { Assignment } from '../../src/contract/assignments'
import { isoWeek, digestDue } from '../../server/digests/digest-service'
import { pageRoster, sortRoster } from '../../server/roster/roster-query'
import { rosterStatus } from '../../server/roster/roster-service'
import { RosterQuerySchema } from '../../server/roster/roster-schema'
import { type RosterRow } from '../../src/contract/roster'
import { STARTER_PLANS } from '../../src/contract/starter-plans'

function row(name: string, over: Partial<RosterRow> = {}): RosterRow {
  return {
    id: name,
    name,
    email: `${name.toLowerCase()}@x.test`,
    studios: [{ id: 'a', name: 'A' }],
    lastPracticeAt: null,
    minutesThisWeek: 0,
    attemptsThisWeek: 0,
    accuracy: null,
    recall: { medianMs: null, previousMedianMs: null, change: null, direction: null },
    plans: { assigned: 0, complete: 0, overdue: 0, targetsMet: 0, targetsTotal: 0 },
    planCompletion: null,
    weakSpots: [],
    status: 'on-track',
    attention: [],
    instrument: null,
    fastestTempo: null,
    sharesFrom: null,
    ...over,
  }
}

const ROWS = [
  row('Mira', { accuracy: 0.9, status: 'behind', studios: [{ id: 'b', name: 'B' }] }),
  row('ada', { accuracy: null, status: 'inactive' }),
  row('Zeno', { accuracy: 0.5 }),
  row('Bo', { accuracy: 0.9 }),
]
const names = (rows: RosterRow[]) => rows.map((r) => r.name)

describe('roster query', () => {
  it('sorts names without regard to case', () => {
    expect(names(sortRoster(ROWS, 'name', false))).toEqual(['ada', 'Bo', 'Mira', 'Zeno'])
  })

  it('puts rows without a value last in both directions, and breaks ties by name', () => {
    expect(names(sortRoster(ROWS, 'accuracy', false))).toEqual(['Zeno', 'Bo', 'Mira', 'ada'])
    expect(names(sortRoster(ROWS, 'accuracy', true))).toEqual(['Bo', 'Mira', 'Zeno', 'ada'])
  })

  it('orders status behind, inactive, on-track', () => {
    expect(names(sortRoster(ROWS, 'status', false))).toEqual(['Mira', 'ada', 'Bo', 'Zeno'])
  })

  it('filters by search, studio and status, then pages; total counts every match', () => {
    const query = (q: object) => RosterQuerySchema.parse(q)
    expect(names(pageRoster(ROWS, query({ search: 'MIR' })).items)).toEqual(['Mira'])
    expect(names(pageRoster(ROWS, query({ studio: undefined, status: 'on-track' })).items)).toEqual(
      ['Bo', 'Zeno'],
    )
    const page2 = pageRoster(
      ROWS,
      query({ page: '2', pageSize: '3', sortBy: 'name', sortDesc: 'true' }),
    )
    expect(page2).toEqual({ total: 4, items: [ROWS[1]] })
  })
})

describe('roster status', () => {
  const now = new Date('2026-03-10T12:00:00Z')
  const assignment = (dueAt: string | null, targetsMet: number, items: number, complete = false) =>
    ({ dueAt, targetsMet, items: Array.from({ length: items }), complete }) as unknown as Assignment
  const practisedYesterday = new Date('2026-03-09T12:00:00Z')

  it('is behind with an overdue unfinished plan, even after practising yesterday', () => {
    expect(rosterStatus(practisedYesterday, [assignment('2026-03-09T00:00:00Z', 1, 2)], now)).toBe(
      'behind',
    )
  })

  it('is behind when a plan is due within 48 h with under half its targets met (1 of 3)', () => {
    expect(rosterStatus(practisedYesterday, [assignment('2026-03-11T12:00:00Z', 1, 3)], now)).toBe(
      'behind',
    )
    expect(rosterStatus(practisedYesterday, [assignment('2026-03-11T12:00:00Z', 2, 3)], now)).toBe(
      'on-track',
    )
  })

  it('is not behind for a finished plan, but inactive after 7 days without practice', () => {
    const eightDaysAgo = new Date('2026-03-02T11:59:00Z')
    expect(rosterStatus(eightDaysAgo, [assignment('2026-03-01T00:00:00Z', 2, 2, true)], now)).toBe(
      'inactive',
    )
    expect(rosterStatus(null, [], now)).toBe('inactive')
  })
})

describe('weekly digest timing', () => {
  it.each([
    ['2026-01-01T12:00:00Z', '2026-W01'], // Thursday 1 January: week 1 holds the year's first Thursday
    ['2027-01-01T12:00:00Z', '2026-W53'], // Friday: still the last week of 2026 (a 53-week year)
    ['2026-12-28T00:30:00Z', '2026-W53'], // Monday
    ['2024-12-30T09:00:00Z', '2025-W01'], // Monday before New Year belongs to the next year's week 1
  ])('%s is in ISO week %s', (date, week) => {
    expect(isoWeek(new Date(date))).toBe(week)
  })

  it('is due from Monday 07:00 UTC on', () => {
    expect(digestDue(new Date('2026-03-09T06:59:00Z'))).toBe(false) // Monday
    expect(digestDue(new Date('2026-03-09T07:00:00Z'))).toBe(true)
    expect(digestDue(new Date('2026-03-12T01:00:00Z'))).toBe(true) // Thursday
  })
})

describe('starter library', () => {
  it('offers our starter plans with complete, schema-checked settings', () => {
    expect(STARTER_PLANS.map((s) => s.title)).toContain('Fourths in a one-octave window')
    const recall = STARTER_PLANS[0]!.items[0]!.preset
    expect(recall.drill === 'recall' && recall.settings.questionCount).toBe(24) // the drill schema's default
  })
})
