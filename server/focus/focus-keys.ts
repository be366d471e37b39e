// Which keys and hand regions hold the player's weak places, so Range Runs, Octave Scatter and
// Window Cycle can prefer them. Pure.
import { scalePitchClasses, scalePitchNames, TONICS } from '../../src/theory'
import type { KeyFocus, RegionFocus } from '../../src/contract/focus'
import type { ScoredCandidate } from './focus-types'

/** A place counts as weak when its score is in the top fifth of the practised board (and above 0.3). */
function weakThreshold(items: readonly ScoredCandidate[]) {
  const scores = items
    .filter((i) => i.attempts > 0)
    .map((i) => i.score)
    .sort((a, b) => b - a)
  return Math.max(0.3, scores[Math.floor(scores.length / 5)] ?? 0)
}

const accidentals = (tonic: string, scale: string) =>
  scalePitchNames(tonic, scale).join('').replace(/[^#b]/g, '').length

/** One spelling per pitch class: the tonic whose scale needs the fewest sharps and flats. */
function tonicsFor(scale: string): string[] {
  const best = new Map<number, string>()
  for (const tonic of TONICS) {
    const root = scalePitchClasses(tonic, scale)[0] ?? 0
    const held = best.get(root)
    if (held === undefined || accidentals(tonic, scale) < accidentals(held, scale))
      best.set(root, tonic)
  }
  return [...best.values()]
}

const mean = (values: number[]) =>
  values.length ? values.reduce((a, b) => a + b, 0) / values.length : 0
const round = (x: number) => Math.round(x * 1000) / 1000

// Only answered places can be weak: a place never practised is "not practised yet", not a weak spot.
function weakReason(places: readonly ScoredCandidate[], threshold: number, what: string) {
  const practised = places.filter((i) => i.attempts > 0)
  if (practised.length === 0) return `not practised yet ${what}`
  const weak = practised.filter((i) => i.score >= threshold).length
  if (weak === 0) return `a balanced review: no weak spots ${what}`
  return `${weak === 1 ? 'one of your weak spots is' : `${weak} of your weak spots are`} ${what}`
}

/** Keys of a scale ranked by the weakness of the places whose notes they use (weakest first). */
export function rankKeys(items: readonly ScoredCandidate[], scale: string, limit = 12): KeyFocus[] {
  const threshold = weakThreshold(items)
  return tonicsFor(scale)
    .map((tonic) => {
      const classes = new Set(scalePitchClasses(tonic, scale))
      const inKey = items.filter((i) => classes.has(i.pitch % 12))
      return {
        tonic,
        scale,
        score: round(mean(inKey.map((i) => i.score))),
        reason: weakReason(inKey, threshold, 'in this key'),
      }
    })
    .sort((a, b) => b.score - a.score)
    .slice(0, limit)
}

/** Hand regions `span` frets wide ranked by the weakness of the places inside them. */
export function rankRegions(
  items: readonly ScoredCandidate[],
  lowFret: number,
  highFret: number,
  span = 5,
): RegionFocus[] {
  const threshold = weakThreshold(items)
  const regions: RegionFocus[] = []
  for (let low = lowFret; low <= Math.max(lowFret, highFret - span + 1); low++) {
    const high = Math.min(highFret, low + span - 1)
    const inside = items.filter((i) => i.fret >= low && i.fret <= high)
    regions.push({
      lowFret: low,
      highFret: high,
      score: round(mean(inside.map((i) => i.score))),
      reason: weakReason(inside, threshold, 'in these frets'),
    })
  }
  return regions.sort((a, b) => b.score - a.score).slice(0, 5)
}
