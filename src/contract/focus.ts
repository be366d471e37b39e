// GET /api/focus: the next questions for a drill, weakest places first, each with the reason it was
// chosen; for drills that take a key, the keys (and for Range Runs the hand regions) worth practising.
import type { DrillId } from './drills'

export interface KeyFocus {
  tonic: string
  scale: string
  score: number
  reason: string
}

export interface RegionFocus {
  lowFret: number
  highFret: number
  score: number
  reason: string
}

/** A question the drill should ask, with the reason shown to the student. */
export interface FocusItem {
  string: number
  fret: number
  pitch: number
  /** Weakness 0..1 (higher = weaker). */
  score: number
  /** When spaced review wants this place again (ISO), null if never practised. */
  due: string | null
  reason: string
}

export interface FocusAnswer {
  instrumentId: string
  drill: DrillId
  items: FocusItem[]
  /** Runs, scatter and cycle: keys of `scale` ranked by the weak places they use. */
  keys?: KeyFocus[]
  /** Runs: 5-fret hand regions ranked by the weak places inside. */
  regions?: RegionFocus[]
  /** Answers stored but not yet in these figures (the statistics are updating); absent means 0. */
  pending?: number
}
