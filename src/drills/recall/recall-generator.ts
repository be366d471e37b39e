// Neck Recall questions: the cells of a blank region, in order or shuffled, weak spots first.
import {
  createRandom,
  nameInContext,
  positionsInRegion,
  shuffled,
  spellPitch,
  type AccidentalPreference,
  type FrettedNote,
  type Position,
} from '../../theory'
import type { RecallSettings } from '../../contract/drills'
import type { DrillQuestion } from '../engine/types'

export interface RecallQuestion extends DrillQuestion {
  cell: Position
  /** The name that counts as the spelling in the key ("Eb"), used when "spell in key" is on. */
  spelled: string
}

/** A weak spot suggested by the focus selector (GET /api/focus). */
export interface FocusCell extends Position {
  pitch: number
  reason: string
}

export type RecallRegion = RecallSettings['region']

/** Ready-made regions offered in the setup (clipped to the instrument's strings and frets). */
export const RECALL_REGION_PRESETS = [
  { label: 'Frets 0–5, all strings', lowFret: 0, highFret: 5 },
  { label: 'Frets 5–9, all strings', lowFret: 5, highFret: 9 },
  { label: 'Frets 7–12, all strings', lowFret: 7, highFret: 12 },
  { label: 'Frets 12–17, all strings', lowFret: 12, highFret: 17 },
  { label: 'Frets 0–12, all strings', lowFret: 0, highFret: 12 },
] as const

/** The region clipped to an instrument (a preset may ask for frets or strings it does not have). */
export function clipRegion(region: RecallRegion, strings: number, frets: number): RecallRegion {
  const highString = Math.min(region.highString, strings - 1)
  const highFret = Math.min(region.highFret, frets)
  return {
    lowString: Math.min(region.lowString, highString),
    highString,
    lowFret: Math.min(region.lowFret, highFret),
    highFret,
  }
}

/** Every cell of a region, string by string from the lowest, then by fret. */
export function regionCells(tuning: readonly number[], region: RecallRegion): FrettedNote[] {
  return positionsInRegion(tuning, region.lowFret, region.highFret).filter(
    (cell) => cell.string >= region.lowString && cell.string <= region.highString,
  )
}

export interface RecallPlan {
  tuning: readonly number[]
  settings: RecallSettings
  accidentals: AccidentalPreference
  seed: number
  /** Weak spots from the focus selector, weakest first; cells outside the region are ignored. */
  focus?: readonly FocusCell[]
}

function toQuestion(cell: FrettedNote, plan: RecallPlan, reason?: string): RecallQuestion {
  const { keyTonic, keyScale, spellInKey: inKey } = plan.settings
  const key = inKey ? { tonic: keyTonic, scale: keyScale } : null
  const name = nameInContext(cell.pitch, { key, prefer: plan.accidentals, withOctave: false })
  return {
    key: `${cell.string}:${cell.fret}`,
    expectedPitch: cell.pitch,
    cell: { string: cell.string, fret: cell.fret },
    spelled: name,
    name: spellPitch(cell.pitch, name),
    detail: reason ? { focusReason: reason.slice(0, 64) } : {},
    ...(reason ? { reason } : {}),
  }
}

const cellKey = (cell: Position) => `${cell.string}:${cell.fret}`

// One round over the region: the focus cells first (weakest first), then the rest, shuffled or in order.
function oneRound(cells: FrettedNote[], plan: RecallPlan, round: number): RecallQuestion[] {
  const random = createRandom((plan.seed + round) >>> 0)
  const inRegion = new Map(cells.map((cell) => [cellKey(cell), cell]))
  const focus = round === 0 && plan.settings.focus ? (plan.focus ?? []) : []
  const weak = focus.filter((item) => inRegion.has(cellKey(item)))
  const weakKeys = new Set(weak.map(cellKey))
  const rest = cells.filter((cell) => !weakKeys.has(cellKey(cell)))
  const ordered = plan.settings.order === 'random' ? shuffled(rest, random) : rest
  return [
    ...weak.map((item) => toQuestion(inRegion.get(cellKey(item)) ?? item, plan, item.reason)),
    ...ordered.map((cell) => toQuestion(cell, plan)),
  ]
}

const bySequence = (a: RecallQuestion, b: RecallQuestion) =>
  a.cell.string - b.cell.string || a.cell.fret - b.cell.fret

/**
 * The questions of a session: `questionCount` cells of the region, every cell once per round (more
 * rounds when the count is larger). With focus on, the weak spots are asked first and are the ones
 * kept when the count is smaller than the region; sequential order then sorts each round string by
 * string, fret by fret. No question count (a time limit only) asks up to 20 rounds.
 */
export function recallQuestions(plan: RecallPlan): RecallQuestion[] {
  const cells = regionCells(plan.tuning, plan.settings.region)
  const count = plan.settings.questionCount ?? cells.length * 20
  const questions: RecallQuestion[] = []
  for (let round = 0; questions.length < count; round += 1) {
    const next = oneRound(cells, plan, round).slice(0, count - questions.length)
    if (plan.settings.order === 'sequential') next.sort(bySequence)
    // a random round never starts with the cell the previous one ended on
    else if (next.length > 1 && next[0]?.key === questions.at(-1)?.key)
      next.push(next.shift() as RecallQuestion)
    questions.push(...next)
  }
  return questions
}
