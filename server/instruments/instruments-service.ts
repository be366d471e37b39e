// Instrument use cases: list (with a default for newcomers), create, change, delete, activate.
import type { AppContext } from '../context'
import { badRequest, conflict, notFound, type FieldErrors } from '../lib/errors'
import { TUNING_PRESETS, tuningErrors } from '../../src/theory'
import {
  countInstruments,
  deleteInstrument,
  findInstrument,
  insertInstrument,
  listInstruments,
  setActiveInstrument,
  updateInstrument,
  withUserLock,
} from './instruments-repository'
import {
  MAX_INSTRUMENTS_PER_USER,
  type Instrument,
  type InstrumentInput,
  type InstrumentPatch,
  type InstrumentPreset,
} from '../../src/contract/instruments'

const MM_PER_INCH = 25.4
const DEFAULT_PRESET_ID = 'bass-4'

/** The tuning presets of the theory core, with the scale length also in millimetres. */
export function listPresets(): InstrumentPreset[] {
  return TUNING_PRESETS.map((preset) => ({
    id: preset.id,
    label: preset.label,
    instrument: preset.instrument,
    notes: [...preset.notes],
    pitches: [...preset.pitches],
    frets: preset.frets,
    scaleLengthInches: preset.scaleLengthInches,
    scaleLengthMm: Math.round(preset.scaleLengthInches * MM_PER_INCH * 10) / 10,
  }))
}

/** What a newcomer gets so they can practise at once: a 4-string bass in standard tuning. */
export function defaultInstrumentInput(): InstrumentInput {
  const preset = listPresets().find((candidate) => candidate.id === DEFAULT_PRESET_ID)!
  return {
    name: '4-string bass',
    presetId: preset.id,
    tuning: preset.pitches,
    frets: preset.frets,
    scaleLengthMm: preset.scaleLengthMm,
    handedness: 'right',
    accidentals: 'flat',
    referenceHz: 440,
    soundOn: true,
    volume: 0.6,
  }
}

// The theory core knows what makes a tuning playable; its sentences become field messages.
function assertPlayable(settings: Pick<InstrumentInput, 'tuning' | 'frets' | 'presetId'>) {
  const fields: FieldErrors = {}
  const errors = tuningErrors(settings.tuning, settings.frets)
  if (errors.length > 0) fields.tuning = errors
  if (settings.presetId !== null && !TUNING_PRESETS.some((p) => p.id === settings.presetId)) {
    fields.presetId = [`"${settings.presetId}" is not a known preset.`]
  }
  if (Object.keys(fields).length > 0) throw badRequest('This tuning cannot be played.', fields)
}

/** The user's instruments, active first; a user with none gets the default one, saved and active. */
export async function listOrCreateInstruments(
  ctx: AppContext,
  userId: string,
): Promise<Instrument[]> {
  const instruments = await listInstruments(ctx.db, userId)
  if (instruments.length > 0) return instruments
  return withUserLock(ctx.db, userId, async (trx) => {
    const again = await listInstruments(trx, userId)
    if (again.length > 0) return again
    return [await insertInstrument(trx, userId, defaultInstrumentInput(), true)]
  })
}

/** Saves a new instrument; the user's first one becomes active, later ones wait to be activated. */
export async function createInstrument(ctx: AppContext, userId: string, input: InstrumentInput) {
  assertPlayable(input)
  return withUserLock(ctx.db, userId, async (trx) => {
    const count = await countInstruments(trx, userId)
    if (count >= MAX_INSTRUMENTS_PER_USER) {
      throw conflict(
        `You can keep up to ${MAX_INSTRUMENTS_PER_USER} instruments; delete one first.`,
      )
    }
    return insertInstrument(trx, userId, input, count === 0)
  })
}

/** Changes some settings of one of the user's instruments; the result must still be playable. */
export async function patchInstrument(
  ctx: AppContext,
  userId: string,
  id: string,
  patch: InstrumentPatch,
): Promise<Instrument> {
  const current = await findInstrument(ctx.db, userId, id)
  if (!current) throw notFound('That instrument')
  if (patch.tuning || patch.frets !== undefined || patch.presetId !== undefined) {
    assertPlayable({ ...current, ...patch })
  }
  const updated = await updateInstrument(ctx.db, userId, id, patch)
  if (!updated) throw notFound('That instrument')
  return updated
}

/** Deletes an instrument, never the last one; deleting the active one activates the oldest left. */
export async function removeInstrument(ctx: AppContext, userId: string, id: string) {
  await withUserLock(ctx.db, userId, async (trx) => {
    const target = await findInstrument(trx, userId, id)
    if (!target) throw notFound('That instrument')
    const all = await listInstruments(trx, userId)
    if (all.length <= 1) {
      throw conflict('Keep at least one instrument: add another before deleting this one.')
    }
    await deleteInstrument(trx, userId, id)
    const next = all.find((instrument) => instrument.id !== id)
    if (target.isActive && next) await setActiveInstrument(trx, userId, next.id)
  })
}

/** Makes one of the user's instruments the active one (exactly one is active at any time). */
export async function activateInstrument(ctx: AppContext, userId: string, id: string) {
  return withUserLock(ctx.db, userId, async (trx) => {
    const activated = await setActiveInstrument(trx, userId, id)
    if (!activated) throw notFound('That instrument')
    return activated
  })
}
