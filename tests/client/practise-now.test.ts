// What "Practise now" offers: a plan's next item before anything else, then the weakest practised
// place (the progress page's rule), then the drill last played here, then a round to keep things
// fresh, and a first session only for someone who has never practised.
import { describe, expect, it } from 'vitest'
import type { Assignment } from '../../src/api/plans'
import {
  choosePractice,
  hasPractised,
  nextPlanItem,
  type PracticeFacts,
} from '../../src/components/drills/practise-now'

const item = (id: string, drill: 'recall' | 'cycle', met: boolean) =>
  ({ id, preset: { drill, settings: {} }, progress: { met } }) as unknown as Assignment['items'][0]

const plan = (over: Partial<Assignment>): Assignment =>
  ({
    id: 'a',
    title: 'Plan',
    dueAt: null,
    complete: false,
    overdue: false,
    items: [],
    ...over,
  }) as Assignment

const place = (string: number, fret: number, recentAnswers: number, recentAccuracy: number) => ({
  string,
  fret,
  recentAnswers,
  recentAccuracy,
  medianMs: 1500,
})

const facts = (over: Partial<PracticeFacts>): PracticeFacts => ({
  assigned: [],
  places: [],
  last: null,
  ...over,
})

describe('nextPlanItem', () => {
  it('takes the first unmet item of the unfinished plan that is overdue, else due soonest', () => {
    const later = plan({
      title: 'Later',
      dueAt: '2026-12-20T17:00:00Z',
      items: [item('l1', 'recall', false)],
    })
    const sooner = plan({
      title: 'Sooner',
      dueAt: '2026-12-08T17:00:00Z',
      items: [item('s1', 'recall', true), item('s2', 'cycle', false)],
    })
    const done = plan({ title: 'Done', complete: true, items: [item('d1', 'recall', false)] })
    const overdue = plan({
      title: 'Overdue',
      overdue: true,
      dueAt: '2026-11-30T17:00:00Z',
      items: [item('o1', 'cycle', false)],
    })
    expect(nextPlanItem([later, sooner, done])?.item.id).toBe('s2') // s1's target is met
    expect(nextPlanItem([later, sooner, overdue])?.item.id).toBe('o1')
    expect(nextPlanItem([done])).toBeNull()
    expect(nextPlanItem([plan({ items: [item('x', 'recall', true)] })])).toBeNull()
  })
})

describe('choosePractice', () => {
  const weak = place(1, 3, 3, 0)
  const shaky = place(0, 5, 10, 0.8)
  const solid = place(2, 2, 8, 1)

  it('offers the next plan item before the weakest place or the last drill', () => {
    const choice = choosePractice(
      facts({
        assigned: [plan({ title: 'Fourths', items: [item('c1', 'cycle', false)] })],
        places: [weak],
        last: 'hunt',
      }),
    )
    expect(choice).toEqual({ kind: 'plan', drill: 'cycle', itemId: 'c1', planTitle: 'Fourths' })
  })

  it('offers the weakest practised place (lowest recent accuracy) when no plan item waits', () => {
    const choice = choosePractice(facts({ places: [solid, shaky, weak], last: 'hunt' }))
    expect(choice).toEqual({ kind: 'weakest', drill: 'recall', place: weak })
  })

  it('never calls a place that was always right weak: then the last drill, else a fresh round', () => {
    expect(choosePractice(facts({ places: [solid], last: 'runs' }))).toEqual({
      kind: 'continue',
      drill: 'runs',
    })
    expect(choosePractice(facts({ places: [solid] }))).toEqual({ kind: 'review', drill: 'recall' })
  })

  it('offers a first session only to someone with no practice here at all', () => {
    expect(choosePractice(facts({}))).toEqual({ kind: 'first', drill: 'hunt' })
    expect(hasPractised(facts({}))).toBe(false)
    expect(hasPractised(facts({ places: [solid] }))).toBe(true)
    expect(hasPractised(facts({ last: 'hunt' }))).toBe(true)
  })
})
