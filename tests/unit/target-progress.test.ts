// Target evaluation of plan items, on hand-computed attempt sets (source: arithmetic, shown beside
// each case; the key list of the cycle of fourths is the one in PRODUCT.md's domain rules).
import { describe, expect, it } from 'vitest'
import { evaluateTarget, median, type ItemAttempt } from '../../server/plans/target-progress'
import { presetKeys, SESSION_MIN_ANSWERS } from '../../src/contract/targets'
import { DrillPresetSchema, type DrillPreset } from '../../src/contract/drills'
import { PracticeTargetSchema } from '../../src/contract/targets'

const T0 = Date.parse('2026-03-02T10:00:00Z')
let clock = 0
function answer(
  correct: boolean,
  responseMs: number,
  extra: Partial<ItemAttempt> = {},
): ItemAttempt {
  clock += 1
  return {
    correct,
    responseMs,
    sessionId: 's1',
    createdAt: new Date(T0 + clock * 1000),
    drill: 'recall',
    key: null,
    ...extra,
  }
}

const RECALL = DrillPresetSchema.parse({
  drill: 'recall',
  settings: { region: { lowString: 0, highString: 3, lowFret: 0, highFret: 5 } },
})
const ACCURACY = PracticeTargetSchema.parse({
  kind: 'accuracy',
  minAccuracy: 0.75,
  maxMedianMs: 2000,
  minAttempts: 4,
})
const cycle = (settings: object): DrillPreset =>
  DrillPresetSchema.parse({ drill: 'cycle', settings: { low: 33, high: 45, ...settings } })

describe('median', () => {
  it.each([
    [[], null],
    [[3], 3],
    [[4, 1, 3, 2], 2.5], // sorted 1 2 3 4 → (2 + 3) / 2
    [[5000, 1000, 1500], 1500],
  ])('median(%j) = %j', (values, expected) => {
    expect(median(values)).toBe(expected)
  })
})

describe('accuracy target: accuracy ≥ x and median ≤ y over the last N answers', () => {
  it('counts only the last 4 answers by time, whatever order they arrive in', () => {
    const oldestWrong = answer(false, 5000)
    const recent = [answer(true, 1000), answer(true, 1500), answer(false, 2500), answer(true, 1200)]
    // last 4: 3 of 4 right = 0.75 ≥ 0.75; times 1000 1200 1500 2500 → median (1200 + 1500) / 2 = 1350 ≤ 2000
    const result = evaluateTarget(ACCURACY, RECALL, [...recent].reverse().concat(oldestWrong))
    expect(result).toEqual({
      kind: 'accuracy',
      met: true,
      ratio: 1,
      attempts: 4,
      needed: 4,
      accuracy: 0.75,
      medianMs: 1350,
    })
  })

  it('is not met with fewer answers than asked for, and the ratio is the share of answers given', () => {
    const result = evaluateTarget(ACCURACY, RECALL, [
      answer(true, 500),
      answer(true, 500),
      answer(true, 500),
    ])
    expect(result.met).toBe(false)
    expect(result.ratio).toBeCloseTo(3 / 4) // count 3/4; accuracy 1/0.75 and speed 2000/500 are above 1
  })

  it('is not met at 50 % accuracy; the ratio is 0.5 / 0.75', () => {
    const result = evaluateTarget(ACCURACY, RECALL, [
      answer(true, 900),
      answer(false, 900),
      answer(true, 900),
      answer(false, 900),
    ])
    expect(result).toMatchObject({ met: false, accuracy: 0.5, medianMs: 900 })
    expect(result.ratio).toBeCloseTo(0.5 / 0.75)
  })

  it('is not met when the median is too slow; the ratio is 2000 / 3500', () => {
    const slow = [answer(true, 3000), answer(true, 5000), answer(true, 3000), answer(true, 4000)]
    const result = evaluateTarget(ACCURACY, RECALL, slow) // sorted 3000 3000 4000 5000 → median 3500
    expect(result).toMatchObject({ met: false, accuracy: 1, medianMs: 3500 })
    expect(result.ratio).toBeCloseTo(2000 / 3500)
  })

  it('ignores speed when no median is asked for', () => {
    const target = PracticeTargetSchema.parse({
      kind: 'accuracy',
      minAccuracy: 0.5,
      maxMedianMs: null,
      minAttempts: 2,
    })
    expect(evaluateTarget(target, RECALL, [answer(true, 59_000), answer(false, 59_000)]).met).toBe(
      true,
    )
  })

  it('has no accuracy and a zero ratio before the first answer', () => {
    expect(evaluateTarget(ACCURACY, RECALL, [])).toEqual({
      kind: 'accuracy',
      met: false,
      ratio: 0,
      attempts: 0,
      needed: 4,
      accuracy: null,
      medianMs: null,
    })
  })
})

describe('sessions target: N sessions of at least SESSION_MIN_ANSWERS answers', () => {
  const target = PracticeTargetSchema.parse({ kind: 'sessions', count: 3 })
  const session = (sessionId: string, answers: number, correct = true) =>
    Array.from({ length: answers }, () => answer(correct, 1, { sessionId }))

  it('counts distinct full sessions, not answers: s1 (10) s1 (2 more) s2 (10) → 2 of 3', () => {
    const result = evaluateTarget(target, RECALL, [
      ...session('s1', 10),
      ...session('s1', 2, false),
      ...session('s2', SESSION_MIN_ANSWERS),
    ])
    expect(result).toMatchObject({ kind: 'sessions', met: false, sessions: 2, needed: 3 })
    expect(result.ratio).toBeCloseTo(2 / 3)
  })

  it('is met at the third full session, right or wrong answers alike', () => {
    const result = evaluateTarget(
      target,
      RECALL,
      ['a', 'b', 'c'].flatMap((id) => session(id, SESSION_MIN_ANSWERS, false)),
    )
    expect(result).toEqual({ kind: 'sessions', met: true, ratio: 1, sessions: 3, needed: 3 })
  })

  it('does not count a session abandoned after 5 answers (issue 16)', () => {
    const two = PracticeTargetSchema.parse({ kind: 'sessions', count: 2 })
    const result = evaluateTarget(two, RECALL, [...session('a', 10), ...session('b', 5)])
    expect(result).toMatchObject({ met: false, sessions: 1, needed: 2 })
  })
})

describe('all-keys target: every tonic of the cycle in a correct Window Cycle answer', () => {
  const target = PracticeTargetSchema.parse({ kind: 'all-keys' })
  const custom = cycle({ cycle: 'custom', customTonics: ['C', 'F', 'Bb'] })
  const cycleAnswer = (correct: boolean, key: string, drill = 'cycle') =>
    answer(correct, 900, { drill, key })

  it('lists the keys still missing: a wrong Bb and a correct Bb from another drill do not count', () => {
    const result = evaluateTarget(target, custom, [
      cycleAnswer(true, 'C'),
      cycleAnswer(true, 'F'),
      cycleAnswer(false, 'Bb'),
      cycleAnswer(true, 'Bb', 'recall'),
    ])
    expect(result).toMatchObject({
      kind: 'all-keys',
      met: false,
      keysPlayed: ['C', 'F'],
      keysMissing: ['Bb'],
    })
    expect(result.ratio).toBeCloseTo(2 / 3)
  })

  it('compares keys by pitch class, so A# completes Bb', () => {
    const result = evaluateTarget(target, custom, [
      cycleAnswer(true, 'C'),
      cycleAnswer(true, 'F'),
      cycleAnswer(true, 'A#'),
    ])
    expect(result).toMatchObject({ met: true, ratio: 1, keysMissing: [] })
  })

  it('takes the twelve keys of the cycle of fourths from C (PRODUCT.md: C F Bb Eb Ab Db Gb B E A D G)', () => {
    expect(presetKeys(cycle({ cycle: 'fourths' }))).toEqual(
      'C F Bb Eb Ab Db Gb B E A D G'.split(' '),
    )
  })

  it('is never met for a preset without keys', () => {
    expect(evaluateTarget(target, RECALL, [cycleAnswer(true, 'C')])).toMatchObject({
      met: false,
      ratio: 0,
    })
  })
})
