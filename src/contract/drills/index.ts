// The drills both sides know: the catalog of drill contracts, the ids, the settings of each, a preset
// (a drill with its settings, as a plan item holds it) and the words that describe one.
// Adding a drill: a contract file beside this one and its line in DRILL_CONTRACTS.
import { z } from 'zod'
import { chordsContract } from './chords'
import { cycleContract } from './cycle'
import type { DrillContract } from './drill-contract'
import { describeLength } from './fields'
import { huntContract } from './hunt'
import { recallContract } from './recall'
import { runsContract } from './runs'
import { scatterContract } from './scatter'

export const DRILL_CONTRACTS = {
  recall: recallContract,
  hunt: huntContract,
  runs: runsContract,
  scatter: scatterContract,
  cycle: cycleContract,
  chords: chordsContract,
} as const

export type DrillId = keyof typeof DRILL_CONTRACTS
export type DrillContractOf<D extends DrillId> = (typeof DRILL_CONTRACTS)[D]

/** The drills in the order the app lists them. */
export const DRILL_IDS = Object.keys(DRILL_CONTRACTS) as [DrillId, ...DrillId[]]
export const DrillIdSchema = z.enum(DRILL_IDS)

export type DrillSettings = { [D in DrillId]: z.infer<DrillContractOf<D>['settings']> }
/** What an attempt of each drill carries in `detail`. */
export type DrillDetail = { [D in DrillId]: z.infer<DrillContractOf<D>['detail']> }

/** The contract of one drill. */
export const drillContract = <D extends DrillId>(id: D): DrillContractOf<D> => DRILL_CONTRACTS[id]

/** The drill's name ("Neck Recall"), or the id itself for one this version does not know. */
export const drillName = (id: string): string =>
  (DRILL_CONTRACTS as Record<string, DrillContract | undefined>)[id]?.name ?? id

type PresetSchema = {
  [D in DrillId]: z.ZodObject<{ drill: z.ZodLiteral<D>; settings: DrillContractOf<D>['settings'] }>
}[DrillId]
const presetOf = (contract: DrillContract) =>
  z.object({ drill: z.literal(contract.id), settings: contract.settings })
const CONTRACT_LIST: readonly DrillContract[] = Object.values(DRILL_CONTRACTS)

/** A drill with its settings (a "preset"): what a practice plan item or a quick-start link holds. */
export const DrillPresetSchema = z.discriminatedUnion(
  'drill',
  CONTRACT_LIST.map(presetOf) as unknown as [PresetSchema, ...PresetSchema[]],
)
export type DrillPreset = z.infer<typeof DrillPresetSchema>

/** What the preset asks for, in one line (without the drill name). */
export function describeSettings(preset: DrillPreset): string {
  const contract = drillContract(preset.drill) as DrillContract
  const length = describeLength(preset.settings)
  return [contract.describe(preset.settings), length].filter(Boolean).join(' · ')
}

/** A plan item's settings as they play on an instrument (see DrillContract.onInstrument). */
export function settingsOnInstrument<D extends DrillId>(
  drill: D,
  settings: DrillSettings[D],
  tuning: readonly number[],
): DrillSettings[D] {
  const contract = drillContract(drill) as DrillContract
  return (contract.onInstrument?.(settings, tuning) ?? settings) as DrillSettings[D]
}

/** "Neck Recall — strings 1–4 …" */
export const describePreset = (preset: DrillPreset) =>
  `${drillContract(preset.drill).name} — ${describeSettings(preset)}`

export * from './drill-contract'
export * from './recall'
export * from './hunt'
export * from './runs'
export * from './scatter'
export * from './cycle'
export * from './chords'
