// Progress toward a plan item's target, computed from the student's attempts of that item. Pure:
// plain data in, plain data out, so the rules are unit-tested with hand-computed cases.
import type { DrillPreset } from '../../src/contract/drills'
import {
  presetKeys,
  SESSION_MIN_ANSWERS,
  type PracticeTarget,
  type TargetProgress,
} from '../../src/contract/targets'
import { pitchClassOf } from '../../src/theory'

/** One graded answer practised for a plan item (the fields the targets look at). */
export interface ItemAttempt {
  correct: boolean
  responseMs: number
  sessionId: string
  createdAt: Date
  drill: string
  /** detail.key of the attempt (the key being played in a Window Cycle), when there is one. */
  key: string | null
}

/** Median of a list of numbers (mean of the two middle values for an even count); null when empty. */
export function median(values: readonly number[]): number | null {
  if (values.length === 0) return null
  const sorted = [...values].sort((a, b) => a - b)
  const mid = Math.floor(sorted.length / 2)
  const upper = sorted[mid] as number
  return sorted.length % 2 ? upper : ((sorted[mid - 1] as number) + upper) / 2
}

const clamp01 = (value: number) => Math.max(0, Math.min(1, value))

/** Accuracy ≥ minAccuracy and median ≤ maxMedianMs over the last `minAttempts` attempts. */
function accuracyProgress(
  target: Extract<PracticeTarget, { kind: 'accuracy' }>,
  attempts: readonly ItemAttempt[],
): TargetProgress {
  const recent = [...attempts]
    .sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime())
    .slice(-target.minAttempts)
  const n = recent.length
  const accuracy = n ? recent.filter((a) => a.correct).length / n : null
  const medianMs = median(recent.map((a) => a.responseMs))
  const countRatio = n / target.minAttempts
  const accuracyRatio =
    accuracy === null ? 0 : target.minAccuracy === 0 ? 1 : accuracy / target.minAccuracy
  const speedRatio =
    target.maxMedianMs === null
      ? 1
      : medianMs === null
        ? 0
        : medianMs === 0
          ? 1
          : target.maxMedianMs / medianMs
  const ratio = clamp01(Math.min(countRatio, accuracyRatio, speedRatio))
  return {
    kind: 'accuracy',
    met: ratio >= 1,
    ratio,
    attempts: n,
    needed: target.minAttempts,
    accuracy,
    medianMs,
  }
}

/** At least `count` practice sessions of the item, each of SESSION_MIN_ANSWERS answers or more. */
function sessionsProgress(
  target: { count: number },
  attempts: readonly ItemAttempt[],
): TargetProgress {
  const answersOf = new Map<string, number>()
  for (const a of attempts) answersOf.set(a.sessionId, (answersOf.get(a.sessionId) ?? 0) + 1)
  const sessions = [...answersOf.values()].filter((n) => n >= SESSION_MIN_ANSWERS).length
  return {
    kind: 'sessions',
    met: sessions >= target.count,
    ratio: clamp01(sessions / target.count),
    sessions,
    needed: target.count,
  }
}

const pitchClassOrNull = (name: string | null) => {
  if (!name) return null
  try {
    return pitchClassOf(name)
  } catch {
    return null
  }
}

/** Every key of the preset appears in a correct attempt of its drill (compared by pitch class). */
function allKeysProgress(preset: DrillPreset, attempts: readonly ItemAttempt[]): TargetProgress {
  const keys = presetKeys(preset)
  const played = new Set(
    attempts
      .filter((a) => a.correct && a.drill === preset.drill)
      .map((a) => pitchClassOrNull(a.key)),
  )
  const keysPlayed = keys.filter((key) => played.has(pitchClassOf(key)))
  const keysMissing = keys.filter((key) => !played.has(pitchClassOf(key)))
  const met = keys.length > 0 && keysMissing.length === 0
  return {
    kind: 'all-keys',
    met,
    ratio: keys.length ? keysPlayed.length / keys.length : 0,
    keysPlayed,
    keysMissing,
  }
}

/**
 * Evaluates one plan item's target against the attempts practised for it (in any order).
 *
 * @example
 * evaluateTarget({ kind: 'sessions', count: 3 }, preset, attempts) // { kind: 'sessions', met: false, ratio: 0.67, sessions: 2, needed: 3 }
 */
export function evaluateTarget(
  target: PracticeTarget,
  preset: DrillPreset,
  attempts: readonly ItemAttempt[],
): TargetProgress {
  if (target.kind === 'accuracy') return accuracyProgress(target, attempts)
  if (target.kind === 'sessions') return sessionsProgress(target, attempts)
  return allKeysProgress(preset, attempts)
}
