// "Needs attention" (issue 16): the reasons in words and their order. The thresholds are our own
// (common practice, no source): a 10-point accuracy drop over 20+ answers a week, recall 10 % slower,
// a week without practice, a plan overdue or due within 48 h with under half its targets met.
import { describe, expect, it } from 'vitest'
import type { Assignment } from '../../src/contract/assignments'
import {
  attentionReasons,
  attentionScore,
  type AttentionFacts,
} from '../../server/roster/attention'
import { sortRoster } from '../../server/roster/roster-query'
import type { RosterRow } from '../../src/contract/roster'

const NOW = new Date('2026-12-03T10:00:00Z')
const daysAgo = (n: number) => new Date(NOW.getTime() - n * 864e5)
const steady = { medianMs: 1500, previousMedianMs: 1500, change: 0, direction: 'steady' as const }
const facts = (over: Partial<AttentionFacts> = {}): AttentionFacts => ({
  lastPracticeAt: daysAgo(1),
  week: { accuracy: 0.9, answers: 100 },
  previousWeek: { accuracy: 0.9, answers: 100 },
  recall: steady,
  assignments: [],
  timeZone: 'UTC',
  ...over,
})
const plan = (title: string, dueAt: Date, targetsMet: number, items: number) =>
  ({
    title,
    dueAt: dueAt.toISOString(),
    targetsMet,
    items: Array.from({ length: items }),
    complete: false,
  }) as unknown as Assignment

describe('attentionReasons', () => {
  it('says nothing for a student who practised yesterday, steady and on time', () => {
    expect(attentionReasons(facts(), NOW)).toEqual([])
  })

  it('names a week without practice, and a first week with none at all', () => {
    expect(attentionReasons(facts({ lastPracticeAt: daysAgo(9) }), NOW)).toEqual([
      { kind: 'no-practice', text: 'No practice for 9 days' },
    ])
    expect(attentionReasons(facts({ lastPracticeAt: null }), NOW)[0]!.text).toBe('No practice yet')
  })

  it('says "since joining" for a student who shared only practice from joining on', () => {
    const f = facts({ lastPracticeAt: null, sharesFrom: daysAgo(1) })
    expect(attentionReasons(f, NOW)).toEqual([
      { kind: 'no-practice', text: 'No practice since joining' },
    ])
  })

  it('names no practice since the last lesson when lessons are kept', () => {
    const f = facts({ lastPracticeAt: daysAgo(3), lastLessonAt: daysAgo(2) })
    expect(attentionReasons(f, NOW)).toEqual([
      { kind: 'no-practice', text: 'No practice since the lesson on Tue 1 Dec' },
    ])
  })

  it('names falling accuracy only with enough answers in both weeks', () => {
    const falling = facts({
      week: { accuracy: 0.64, answers: 50 },
      previousWeek: { accuracy: 0.86, answers: 60 },
    })
    expect(attentionReasons(falling, NOW)).toEqual([
      { kind: 'accuracy-falling', text: 'Accuracy down from 86 % to 64 %' },
    ])
    const few = facts({
      week: { accuracy: 0.5, answers: 5 },
      previousWeek: { accuracy: 0.9, answers: 60 },
    })
    expect(attentionReasons(few, NOW)).toEqual([])
  })

  it('names slowing recall from 10 % on', () => {
    const slower = facts({ recall: { ...steady, change: 0.25, direction: 'slower' } })
    expect(attentionReasons(slower, NOW)[0]!.text).toBe('Recall 25 % slower than the week before')
    expect(
      attentionReasons(facts({ recall: { ...steady, change: 0.07, direction: 'slower' } }), NOW),
    ).toEqual([])
  })

  it('puts an overdue plan before being behind and before no practice', () => {
    const reasons = attentionReasons(
      facts({
        lastPracticeAt: daysAgo(10),
        assignments: [plan('Week 3', daysAgo(-1), 0, 4), plan('Week 2', daysAgo(2), 1, 2)],
      }),
      NOW,
    )
    expect(reasons.map((r) => r.kind)).toEqual(['overdue', 'behind-targets', 'no-practice'])
    expect(reasons[0]!.text).toBe('"Week 2" is overdue (1 of 2 targets met)')
    expect(reasons[1]!.text).toBe('Behind on "Week 3", due soon: 0 of 4 targets met')
  })
})

describe('sorting by attention', () => {
  const row = (name: string, attention: RosterRow['attention']) =>
    ({ name, attention }) as RosterRow
  it('puts the students who need attention most first, ties by name', () => {
    const rows = [
      row('Ada', []),
      row('Bo', [{ kind: 'recall-slowing', text: '' }]),
      row('Cy', [{ kind: 'overdue', text: '' }]),
      row('Di', []),
    ]
    expect(sortRoster(rows, 'attention', false).map((r) => r.name)).toEqual([
      'Cy',
      'Bo',
      'Ada',
      'Di',
    ])
    expect(attentionScore(rows[2]!.attention)).toBeGreaterThan(attentionScore(rows[1]!.attention))
  })
})
