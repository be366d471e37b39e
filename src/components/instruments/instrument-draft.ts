// The instrument editor's working copy and the checks it runs before saving (the server checks again).
import { tuningErrors } from '@/theory'
import type { Instrument, InstrumentInput, InstrumentPreset } from '@/api/instruments'

export type InstrumentDraft = InstrumentInput

export const MM_PER_INCH = 25.4
export const STRING_COUNTS = [4, 5, 6, 7, 8]
/** Open-string choices: A0 (21) to E5 (76) covers basses and guitars in any usual tuning. */
export const OPEN_STRING_RANGE = { low: 21, high: 76 }
export const FRET_CHOICES = Array.from({ length: 13 }, (_, i) => 12 + i) // 12–24
export const REFERENCE_TYPICAL = { low: 415, high: 466 }

export function draftFromInstrument(instrument: Instrument): InstrumentDraft {
  const {
    name,
    presetId,
    tuning,
    frets,
    scaleLengthMm,
    handedness,
    accidentals,
    referenceHz,
    soundOn,
    volume,
  } = instrument
  return {
    name,
    presetId,
    tuning: [...tuning],
    frets,
    scaleLengthMm,
    handedness,
    accidentals,
    referenceHz,
    soundOn,
    volume,
  }
}

/** The instrument's name a preset suggests: its label without the notes ("5-string bass"). */
export const presetShortName = (preset: Pick<InstrumentPreset, 'label'>) =>
  preset.label.replace(/\s*\(.*\)$/, '')

/** A new instrument from a preset, with the usual sound settings. */
export function draftFromPreset(
  preset: InstrumentPreset,
  base?: Partial<InstrumentDraft>,
): InstrumentDraft {
  return {
    name: base?.name ?? presetShortName(preset),
    presetId: preset.id,
    tuning: [...preset.pitches],
    frets: Math.min(24, preset.frets),
    scaleLengthMm: preset.scaleLengthMm,
    handedness: base?.handedness ?? 'right',
    accidentals: base?.accidentals ?? 'flat',
    referenceHz: base?.referenceHz ?? 440,
    soundOn: base?.soundOn ?? true,
    volume: base?.volume ?? 0.6,
  }
}

/** More strings are added above the top one, a fourth apart (as basses and guitars mostly are). */
export function resizeTuning(tuning: readonly number[], count: number): number[] {
  const next = tuning.slice(0, count)
  while (next.length < count)
    next.push(Math.min(OPEN_STRING_RANGE.high, (next[next.length - 1] ?? 28) + 5))
  return next
}

/** The preset whose open strings these are, if any (so a hand-made standard tuning keeps its name). */
export function presetFor(
  tuning: readonly number[],
  presets: readonly InstrumentPreset[],
): string | null {
  const match = presets.find(
    (p) => p.pitches.length === tuning.length && p.pitches.every((x, i) => x === tuning[i]),
  )
  return match?.id ?? null
}

/** What stops the draft from being saved, as sentences keyed by field. */
export function draftProblems(draft: InstrumentDraft): Record<string, string[]> {
  const problems: Record<string, string[]> = {}
  if (!draft.name.trim()) problems.name = ['Give the instrument a name.']
  const tuning = tuningErrors(draft.tuning, draft.frets)
  if (tuning.length > 0) problems.tuning = tuning
  if (!(draft.scaleLengthMm >= 300 && draft.scaleLengthMm <= 1000)) {
    problems.scaleLengthMm = ['Scale length from 300 to 1000 mm.']
  }
  if (!(draft.referenceHz >= 400 && draft.referenceHz <= 480)) {
    problems.referenceHz = ['Reference pitch from 400 to 480 Hz.']
  }
  return problems
}

export const inches = (mm: number) => (mm / MM_PER_INCH).toFixed(1)
