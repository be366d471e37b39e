// A student's active instrument in the roster's words: its name, what it is ("5-string bass (B E A
// D G)" for a preset, "6 strings (D A D G B E)" otherwise) and whether it is left-handed.
import { stringNames, TUNING_PRESETS } from '../../src/theory'
import type { RosterInstrument } from '../../src/contract/roster'
import type { ActiveInstrumentRow } from './roster-repository'

export function instrumentOf(row: ActiveInstrumentRow | undefined): RosterInstrument | null {
  if (!row) return null
  const tuning = row.tuning.map(Number)
  const preset = TUNING_PRESETS.find(
    (p) => p.id === row.preset_id && p.pitches.join() === tuning.join(),
  )
  let description = preset?.label ?? `${tuning.length} strings`
  if (!preset) {
    try {
      description += ` (${stringNames(tuning, row.accidentals).join(' ')})`
    } catch {
      // a tuning the theory core refuses: the string count alone
    }
  }
  return {
    name: row.name,
    description,
    leftHanded: row.handedness === 'left',
    tuning,
    frets: row.frets,
    accidentals: row.accidentals,
  }
}
