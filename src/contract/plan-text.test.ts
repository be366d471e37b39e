// Plain-language plan items, as e-mails, the plan editor and the drill banner show them.
import { describe, expect, it } from 'vitest'
import { DrillPresetSchema } from './drills'
import { PracticeTargetSchema } from './targets'
import { describePreset } from './drills'
import { describeTarget } from './targets'

describe('describeTarget', () => {
  it.each([
    [
      { kind: 'accuracy', minAccuracy: 0.9, maxMedianMs: 2500, minAttempts: 60 },
      'accuracy ≥ 90 % and median answer ≤ 2.5 s over the last 60 answers',
    ],
    [
      { kind: 'accuracy', minAccuracy: 0.8, maxMedianMs: null, minAttempts: 10 },
      'accuracy ≥ 80 % over the last 10 answers',
    ],
    [{ kind: 'sessions', count: 1 }, '1 practice session of 10+ answers'],
    [{ kind: 'sessions', count: 4 }, '4 practice sessions of 10+ answers'],
    [{ kind: 'all-keys' }, 'every key of the cycle played correctly'],
  ])('%j reads "%s"', (target, text) => {
    expect(describeTarget(PracticeTargetSchema.parse(target))).toBe(text)
  })
})

describe('describePreset', () => {
  it('names the drill, what it covers and the session length', () => {
    const recall = DrillPresetSchema.parse({
      drill: 'recall',
      settings: { region: { lowString: 0, highString: 3, lowFret: 0, highFret: 5 } },
    })
    expect(describePreset(recall)).toBe(
      'Neck Recall — strings 1–4 (lowest = 1), frets 0–5 · 24 questions',
    )
  })

  it('spells the window of a cycle with flats and keeps proper names capitalised', () => {
    const cycle = DrillPresetSchema.parse({
      drill: 'cycle',
      settings: { low: 34, high: 46, scale: 'minor', questionCount: null, timeLimitMinutes: 10 },
    })
    expect(describePreset(cycle)).toBe(
      'Window Cycle — natural minor (Aeolian), cycle of fourths, window Bb1–Bb2 · 10 min',
    )
  })
})
