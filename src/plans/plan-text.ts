// Plain-language descriptions of plan items and targets, shared by the e-mails and the client.
// Pure: drill contracts and the theory core only.
import { DRILLS, type DrillPreset, type PracticeTarget } from '../drills/drill-settings'
import { CYCLES, pitchName, SCALE_TYPES } from '../theory'

const percent = (value: number) => `${Math.round(value * 100)} %`
const seconds = (ms: number) => `${(ms / 1000).toFixed(1)} s`
/** The scale's label as it reads mid-sentence: "natural minor (Aeolian)". */
const scaleLabel = (scale: string) => {
  const label = SCALE_TYPES.find((s) => s.name === scale)?.label ?? scale
  return `${label.charAt(0).toLowerCase()}${label.slice(1)}`
}

/** "accuracy ≥ 90 % and median ≤ 2.5 s over the last 60 answers", "3 sessions", "every key of the cycle". */
export function describeTarget(target: PracticeTarget): string {
  if (target.kind === 'sessions')
    return `${target.count} practice session${target.count === 1 ? '' : 's'}`
  if (target.kind === 'all-keys') return 'every key of the cycle played correctly'
  const speed =
    target.maxMedianMs === null ? '' : ` and median answer ≤ ${seconds(target.maxMedianMs)}`
  return `accuracy ≥ ${percent(target.minAccuracy)}${speed} over the last ${target.minAttempts} answers`
}

function lengthOf(settings: {
  questionCount: number | null
  timeLimitMinutes: number | null
}): string {
  const parts = []
  if (settings.questionCount !== null) parts.push(`${settings.questionCount} questions`)
  if (settings.timeLimitMinutes !== null) parts.push(`${settings.timeLimitMinutes} min`)
  return parts.join(', ')
}

function cycleLabel(cycle: string, customTonics: readonly string[]): string {
  if (cycle === 'custom') return `keys ${customTonics.join(' ')}`
  return CYCLES.find((c) => c.id === cycle)?.label.toLowerCase() ?? cycle
}

/** What the preset asks for, in one line (without the drill name). */
export function describeSettings(preset: DrillPreset): string {
  const parts: string[] = []
  if (preset.drill === 'recall') {
    const { region } = preset.settings
    parts.push(
      `strings ${region.lowString + 1}–${region.highString + 1} (lowest = 1), frets ${region.lowFret}–${region.highFret}`,
    )
  } else if (preset.drill === 'hunt') {
    const s = preset.settings
    parts.push(`frets ${s.lowFret}–${s.highFret}${s.findAll ? ', find every place' : ''}`)
  } else if (preset.drill === 'runs') {
    const s = preset.settings
    parts.push(`${s.tonic} ${scaleLabel(s.scale)}, frets ${s.lowFret}–${s.highFret}`)
  } else if (preset.drill === 'scatter') {
    const s = preset.settings
    const window =
      s.low !== null && s.high !== null
        ? `, ${pitchName(s.low, 'flat')}–${pitchName(s.high, 'flat')}`
        : ''
    parts.push(`${s.tonic} ${scaleLabel(s.scale)}${window}`)
  } else {
    const s = preset.settings
    parts.push(
      `${scaleLabel(s.scale)}, ${cycleLabel(s.cycle, s.customTonics)}, window ${pitchName(s.low, 'flat')}–${pitchName(s.high, 'flat')}`,
    )
  }
  const length = lengthOf(preset.settings)
  if (length) parts.push(length)
  return parts.join(' · ')
}

/** "Neck Recall — strings 1–4 …" */
export function describePreset(preset: DrillPreset): string {
  return `${DRILLS[preset.drill].name} — ${describeSettings(preset)}`
}
