// How drills write times, cells and notes for people (♯/♭ glyphs, "A string, fret 5").
import {
  noteAt,
  pitchName,
  stringNames,
  stringNumber,
  toUnicode,
  type AccidentalPreference,
  type Position,
} from '../theory'

/** "0.8 s", "12.4 s" (one decimal), "—" when there is nothing to show. */
export function formatSeconds(ms: number | null): string {
  return ms === null ? '—' : `${(ms / 1000).toFixed(1)} s`
}

/** A running clock: "0:07", "3:05", "12:40". */
export function formatClock(ms: number): string {
  const total = Math.max(0, Math.floor(ms / 1000))
  return `${Math.floor(total / 60)}:${String(total % 60).padStart(2, '0')}`
}

/** "92 %" (whole percent), "—" when nothing was answered. */
export function formatPercent(ratio: number | null): string {
  return ratio === null ? '—' : `${Math.round(ratio * 100)} %`
}

/** "A string, fret 5" ("low B string" on a 7-string, "open E string" at fret 0). */
export function cellName(
  tuning: readonly number[],
  cell: Position,
  accidentals: AccidentalPreference,
): string {
  const name = toUnicode(
    stringNames(tuning, accidentals)[cell.string] ??
      `string ${stringNumber(cell.string, tuning.length)}`,
  )
  return cell.fret === 0 ? `open ${name} string` : `${name} string, fret ${cell.fret}`
}

/** The note a cell sounds, with octave and glyphs ("E♭2"). */
export function cellNote(
  tuning: readonly number[],
  cell: Position,
  accidentals: AccidentalPreference,
): string {
  return toUnicode(pitchName(noteAt(tuning, cell.string, cell.fret), accidentals))
}

/** A pitch with octave and glyphs ("B♭1"). */
export const notePitch = (pitch: number, accidentals: AccidentalPreference) =>
  toUnicode(pitchName(pitch, accidentals))
