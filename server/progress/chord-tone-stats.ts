// Chord Tones figures pooled from the rollup rows: per chord type, per degree, per type × degree
// (rows of several instruments pool their answers and their recent right-answer times).
import type { ChordToneFigures, ChordTonesAnswer } from '../../src/contract/progress'
import { median } from './percentile'
import type { ChordToneRow } from './progress-repository'

function figuresOf(rows: readonly ChordToneRow[]): ChordToneFigures {
  const attempts = rows.reduce((sum, r) => sum + r.attempts, 0)
  const correct = rows.reduce((sum, r) => sum + r.correct, 0)
  const last = rows.reduce<Date | null>((at, r) => (!at || r.lastAt > at ? r.lastAt : at), null)
  return {
    attempts,
    correct,
    accuracy: attempts ? correct / attempts : null,
    medianMs: median(rows.flatMap((r) => r.recentMs)),
    lastSeenAt: last ? last.toISOString() : null,
  }
}

function grouped(rows: readonly ChordToneRow[], keyOf: (row: ChordToneRow) => string) {
  const groups = new Map<string, ChordToneRow[]>()
  for (const row of rows) groups.set(keyOf(row), [...(groups.get(keyOf(row)) ?? []), row])
  return [...groups.entries()]
}

// Degrees in the order of the chord: 1, b2 … 7 (by number, then flats before sharps).
const degreeOrder = (degree: string) =>
  Number(degree.replace(/[#b]/g, '')) * 10 +
  (degree.startsWith('b') ? -degree.length : degree.length)

/** The three views of a player's chord-tone answers, weakest chord types first. */
export function chordToneFigures(
  rows: readonly ChordToneRow[],
  instrumentId: string | null,
): ChordTonesAnswer {
  const chordTypes = grouped(rows, (r) => r.chordType)
    .map(([chordType, group]) => ({ chordType, ...figuresOf(group) }))
    .sort((a, b) => (a.accuracy ?? 1) - (b.accuracy ?? 1) || a.chordType.localeCompare(b.chordType))
  const degrees = grouped(rows, (r) => r.degree)
    .map(([degree, group]) => ({ degree, ...figuresOf(group) }))
    .sort((a, b) => degreeOrder(a.degree) - degreeOrder(b.degree))
  const cells = grouped(rows, (r) => `${r.chordType}|${r.degree}`).map(([, group]) => ({
    chordType: group[0]?.chordType ?? '',
    degree: group[0]?.degree ?? '',
    ...figuresOf(group),
  }))
  return { instrumentId, chordTypes, degrees, cells }
}
