// What a plan item will show on one student's instrument, in words for the plan editor: the concrete
// strings of a region counted from the lowest or highest string, and where frets or a pitch window
// do not fit that instrument.
import {
  instrumentRange,
  pitchName,
  stringNames,
  toUnicode,
  type AccidentalPreference,
} from '../theory'
import { describeSettings, drillContract, type DrillContract, type DrillPreset } from './drills'
import { spanOnInstrument } from './string-span'

/** The parts of an instrument a preview needs: open strings lowest first, frets, spelling. */
export interface PreviewNeck {
  tuning: readonly number[]
  frets: number
  accidentals: AccidentalPreference
}

export interface ItemPreview {
  /** "strings B–D, frets 5–8" (a region) or the item's own description. */
  text: string
  /** What does not fit this instrument, in words; empty when everything does. */
  warnings: string[]
}

interface Loose {
  region?: { lowString: number; highString: number; lowFret: number; highFret: number }
  lowFret?: number
  highFret?: number
  low?: number | null
  high?: number | null
}

/** The region's strings on the instrument by name, and whether part of them is missing there. */
function regionText(preset: DrillPreset, neck: PreviewNeck) {
  const settings = (drillContract(preset.drill) as DrillContract).onInstrument?.(
    preset.settings,
    neck.tuning,
  ) as Loose
  const region = settings.region!
  const names = stringNames(neck.tuning, neck.accidentals)
  const wanted = 'strings' in preset.settings && preset.settings.strings
  const cut = wanted
    ? spanOnInstrument(wanted, neck.tuning.length).cut
    : region.highString > neck.tuning.length - 1
  const low = names[Math.min(region.lowString, names.length - 1)]!
  const high = names[Math.min(region.highString, names.length - 1)]!
  const strings = low === high ? `string ${low}` : `strings ${low}–${high}`
  const warning = cut
    ? `only ${neck.tuning.length} strings here, so not every string asked for`
    : ''
  return { text: `${strings}, frets ${region.lowFret}–${region.highFret}`, warning }
}

function fitWarnings(settings: Loose, neck: PreviewNeck): string[] {
  const warnings: string[] = []
  const highFret = settings.region?.highFret ?? settings.highFret
  if (highFret !== undefined && highFret > neck.frets)
    warnings.push(`frets above ${neck.frets} are not on this instrument`)
  const range = instrumentRange(neck.tuning, neck.frets)
  const name = (pitch: number) => toUnicode(pitchName(pitch, neck.accidentals))
  if (typeof settings.low === 'number' && settings.low < range.low)
    warnings.push(`${name(settings.low)} is below its lowest note, ${name(range.low)}`)
  if (typeof settings.high === 'number' && settings.high > range.high)
    warnings.push(`${name(settings.high)} is above its highest note, ${name(range.high)}`)
  return warnings
}

/**
 * What a plan item asks of a student with this instrument.
 *
 * @example
 * previewOnInstrument(
 *   { drill: 'recall', settings: { ...recallDefaults, strings: { from: 'lowest', to: '3rd-lowest' } } },
 *   { tuning: [23, 28, 33, 38, 43], frets: 24, accidentals: 'flat' },
 * ).text // 'strings B–A, frets 0–5'
 */
export function previewOnInstrument(preset: DrillPreset, neck: PreviewNeck): ItemPreview {
  const settings = preset.settings as Loose
  if (settings.region) {
    const { text, warning } = regionText(preset, neck)
    return { text, warnings: [warning, ...fitWarnings(settings, neck)].filter(Boolean) }
  }
  return { text: toUnicode(describeSettings(preset)), warnings: fitWarnings(settings, neck) }
}
