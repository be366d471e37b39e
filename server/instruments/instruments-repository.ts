// Instruments table access: the only place that knows its columns.
import type { Knex } from 'knex'
import type { Db } from '../lib/db'
import type { Instrument, InstrumentInput, InstrumentPatch } from '../../src/contract/instruments'

interface InstrumentRow {
  id: string
  user_id: string
  name: string
  preset_id: string | null
  tuning: number[]
  frets: number
  scale_length_mm: string
  handedness: 'right' | 'left'
  accidentals: 'sharp' | 'flat'
  reference_hz: string
  sound_on: boolean
  volume: number
  is_active: boolean
  created_at: Date
  updated_at: Date
}

const COLUMNS: Record<keyof InstrumentPatch, string> = {
  name: 'name',
  presetId: 'preset_id',
  tuning: 'tuning',
  frets: 'frets',
  scaleLengthMm: 'scale_length_mm',
  handedness: 'handedness',
  accidentals: 'accidentals',
  referenceHz: 'reference_hz',
  soundOn: 'sound_on',
  volume: 'volume',
}

// numeric columns come back from pg as strings
const toInstrument = (row: InstrumentRow): Instrument => ({
  id: row.id,
  name: row.name,
  presetId: row.preset_id,
  tuning: row.tuning.map(Number),
  frets: row.frets,
  scaleLengthMm: Number(row.scale_length_mm),
  handedness: row.handedness,
  accidentals: row.accidentals,
  referenceHz: Number(row.reference_hz),
  soundOn: row.sound_on,
  volume: row.volume,
  isActive: row.is_active,
  createdAt: row.created_at.toISOString(),
})

function toColumns(fields: InstrumentPatch): Record<string, unknown> {
  const columns: Record<string, unknown> = {}
  for (const [key, value] of Object.entries(fields)) {
    const column = COLUMNS[key as keyof InstrumentPatch]
    if (column && value !== undefined) columns[column] = value
  }
  return columns
}

/** Runs `work` in a transaction holding a per-user lock, so "exactly one active" never races. */
export function withUserLock<T>(
  db: Db,
  userId: string,
  work: (trx: Knex.Transaction) => Promise<T>,
) {
  return db.transaction(async (trx) => {
    await trx.raw('select pg_advisory_xact_lock(hashtext(?))', [`instruments:${userId}`])
    return work(trx)
  })
}

/** The user's instruments, the active one first, then oldest first. */
export async function listInstruments(
  db: Db | Knex.Transaction,
  userId: string,
): Promise<Instrument[]> {
  const rows = await db<InstrumentRow>('instruments')
    .where({ user_id: userId })
    .orderBy([{ column: 'is_active', order: 'desc' }, 'created_at', 'id'])
  return rows.map(toInstrument)
}

export async function findInstrument(db: Db | Knex.Transaction, userId: string, id: string) {
  const row = await db<InstrumentRow>('instruments').where({ id, user_id: userId }).first()
  return row ? toInstrument(row) : null
}

export async function countInstruments(db: Db | Knex.Transaction, userId: string): Promise<number> {
  const [row] = await db('instruments').where({ user_id: userId }).count({ n: '*' })
  return Number(row?.n ?? 0)
}

export async function insertInstrument(
  db: Db | Knex.Transaction,
  userId: string,
  input: InstrumentInput,
  isActive: boolean,
): Promise<Instrument> {
  const [row] = await db<InstrumentRow>('instruments')
    .insert({ ...toColumns(input), user_id: userId, is_active: isActive })
    .returning('*')
  return toInstrument(row as InstrumentRow)
}

export async function updateInstrument(
  db: Db | Knex.Transaction,
  userId: string,
  id: string,
  patch: InstrumentPatch,
): Promise<Instrument | null> {
  const [row] = await db<InstrumentRow>('instruments')
    .where({ id, user_id: userId })
    .update({ ...toColumns(patch), updated_at: db.fn.now() })
    .returning('*')
  return row ? toInstrument(row as InstrumentRow) : null
}

export async function deleteInstrument(db: Db | Knex.Transaction, userId: string, id: string) {
  return (await db('instruments').where({ id, user_id: userId }).delete()) > 0
}

/** Makes one instrument the active one (clears the others first: the partial unique index allows one). */
export async function setActiveInstrument(trx: Knex.Transaction, userId: string, id: string) {
  await trx('instruments').where({ user_id: userId, is_active: true }).update({ is_active: false })
  const [row] = await trx<InstrumentRow>('instruments')
    .where({ id, user_id: userId })
    .update({ is_active: true, updated_at: trx.fn.now() })
    .returning('*')
  return row ? toInstrument(row as InstrumentRow) : null
}
