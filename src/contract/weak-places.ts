// Which practised places count as weak spots, and in what order: one rule for the roster, the
// student page and the heat map's "places to practise most", so they never disagree.

/** A place's recent figures as the rule reads them (latest 50 answers of that place). */
export interface PlaceFigures {
  string: number
  fret: number
  recentAnswers: number
  recentAccuracy: number | null
  medianMs: number | null
}

/** A place is weak once any of its recent answers was wrong; a place always right is not. */
export const isWeakPlace = (p: PlaceFigures) =>
  p.recentAnswers > 0 && p.recentAccuracy !== null && p.recentAccuracy < 1

/** Worst first: lowest recent accuracy, then more answers (surer), then slower, then string and fret. */
export function compareWeakPlaces(a: PlaceFigures, b: PlaceFigures): number {
  return (
    (a.recentAccuracy ?? 1) - (b.recentAccuracy ?? 1) ||
    b.recentAnswers - a.recentAnswers ||
    (b.medianMs ?? -1) - (a.medianMs ?? -1) ||
    a.string - b.string ||
    a.fret - b.fret
  )
}

/** The `count` weakest places, worst first; places never answered wrong are left out. */
export function weakestOf<T extends PlaceFigures>(places: T[], count: number): T[] {
  return places.filter(isWeakPlace).sort(compareWeakPlaces).slice(0, count)
}
