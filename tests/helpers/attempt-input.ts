// A valid recorded answer for client tests of the attempts queue (ids numbered, so each is new).
import type { AttemptInput } from '../../src/api/attempts'

let sequence = 0

/** A right Neck Recall answer (C at string 1, fret 3 of a 4-string bass) with a fresh id. */
export function attemptInput(overrides: Partial<AttemptInput> = {}): AttemptInput {
  sequence += 1
  return {
    id: `00000000-0000-4000-8000-${String(sequence).padStart(12, '0')}`,
    instrumentId: null,
    tuning: [28, 33, 38, 43],
    drill: 'recall',
    sessionId: '00000000-0000-4000-8000-aaaaaaaaaaaa',
    string: 1,
    fret: 3,
    expectedPitch: 36,
    answer: 'C',
    correct: true,
    responseMs: 1200,
    createdAt: new Date().toISOString(),
    detail: {},
    planItemId: null,
    outcome: 'answered',
    ...overrides,
  }
}
