// shared_exercises table access: the only place that knows its columns.
import type { Db } from '../lib/db'
import type { DrillPreset } from '../../src/contract/drills'
import type { ShareCreate, ShareLink } from '../../src/contract/shares'

interface ShareRow {
  token: string
  owner_id: string
  drill: string
  settings: Record<string, unknown>
  fingering: string | null
  title: string
  instrument_name: string
  tuning: number[]
  frets: number
  created_at: Date
  revoked_at: Date | null
  owner_name: string
}

/** A stored share with its owner's id (for the owner check) and display name. */
export type StoredShare = ShareLink & { ownerId: string }

const toShare = (row: ShareRow): StoredShare => ({
  token: row.token,
  ownerId: row.owner_id,
  preset: { drill: row.drill, settings: row.settings } as DrillPreset,
  fingering: row.fingering,
  title: row.title,
  instrument: { name: row.instrument_name, tuning: row.tuning.map(Number), frets: row.frets },
  sharedBy: row.owner_name,
  createdAt: row.created_at.toISOString(),
  revokedAt: row.revoked_at?.toISOString() ?? null,
})

const selectShares = (db: Db) =>
  db('shared_exercises as s')
    .join('users as u', 'u.id', 's.owner_id')
    .select<ShareRow[]>('s.*', 'u.name as owner_name')

export async function insertShare(
  db: Db,
  ownerId: string,
  token: string,
  share: ShareCreate,
): Promise<void> {
  await db('shared_exercises').insert({
    token,
    owner_id: ownerId,
    drill: share.preset.drill,
    settings: JSON.stringify(share.preset.settings),
    fingering: share.fingering,
    title: share.title,
    instrument_name: share.instrument.name,
    tuning: share.instrument.tuning,
    frets: share.instrument.frets,
  })
}

export async function findShare(db: Db, token: string): Promise<StoredShare | null> {
  const row = await selectShares(db).where('s.token', token).first()
  return row ? toShare(row) : null
}

/** The owner's links, newest first (revoked ones too, so the list says what happened). */
export async function listShares(db: Db, ownerId: string, limit: number): Promise<StoredShare[]> {
  const rows = await selectShares(db)
    .where('s.owner_id', ownerId)
    .orderBy('s.created_at', 'desc')
    .limit(limit)
  return rows.map(toShare)
}

export async function countOpenShares(db: Db, ownerId: string): Promise<number> {
  const row = await db('shared_exercises')
    .where({ owner_id: ownerId })
    .whereNull('revoked_at')
    .count<{ count: string }[]>('* as count')
    .first()
  return Number(row?.count ?? 0)
}

/** Marks the link revoked (once); false when it was already revoked. */
export async function revokeShare(db: Db, token: string): Promise<boolean> {
  const changed = await db('shared_exercises')
    .where({ token })
    .whereNull('revoked_at')
    .update({ revoked_at: db.fn.now() })
  return changed > 0
}
