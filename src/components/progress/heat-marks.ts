// Heat-map marks for the fretboard from per-place figures: accuracy (more right = deeper, from 50 %
// — below that is a guess between neighbours — to 100 %) or recall time (slower = deeper, on a log
// scale from 0.6 s to 5 s). Fixed scales, so colours compare across students and days.
import type { CellMark } from '@/components/fretboard/fretboard-types'
import type { PositionFigures } from '@/api/progress'
import { weakestOf } from '@/contract/weak-places'

export type HeatMode = 'accuracy' | 'speed'
export const FAST_MS = 600
export const SLOW_MS = 5000

const clamp = (x: number) => Math.min(1, Math.max(0, x))

/** 0 at 0.6 s or faster, 1 at 5 s or slower, logarithmic in between. */
export const speedHeat = (ms: number) => clamp(Math.log(ms / FAST_MS) / Math.log(SLOW_MS / FAST_MS))

const accuracyOf = (p: PositionFigures) => p.recentAccuracy ?? p.accuracy ?? 0
export const LOW_ACCURACY = 0.5

/** 0 at 50 % right or less, 1 at 100 %. */
export const accuracyHeat = (accuracy: number) =>
  clamp((accuracy - LOW_ACCURACY) / (1 - LOW_ACCURACY))

/** One mark per practised place within the drawn frets; places without a right answer have no speed. */
export function heatMarks(
  positions: PositionFigures[],
  mode: HeatMode,
  fretEnd: number,
): CellMark[] {
  return positions
    .filter((p) => p.fret <= fretEnd && (mode === 'accuracy' || p.medianMs !== null))
    .map((p) =>
      mode === 'accuracy'
        ? {
            string: p.string,
            fret: p.fret,
            kind: 'highlight',
            heat: accuracyHeat(accuracyOf(p)),
            label: `${Math.round(accuracyOf(p) * 100)}%`,
          }
        : {
            string: p.string,
            fret: p.fret,
            kind: 'highlight',
            heat: speedHeat(p.medianMs!),
            label: `${(p.medianMs! / 1000).toFixed(1)}s`,
          },
    )
}

/** Fewer recent answers than this, and a place's figures are told as tentative. */
export const FEW_ANSWERS = 3

/** The places most worth practising (the roster's rule): a recent miss, worst first. */
export const weakestPlaces = (positions: PositionFigures[], count = 5): PositionFigures[] =>
  weakestOf(positions, count)
