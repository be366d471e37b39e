// The recordings table: metadata of each uploaded take; the bytes are in recording storage.
import type { Db } from '../lib/db'
import type { RecordingSummary } from '../../src/contract/assignments'

export interface RecordingRow {
  id: string
  assignment_id: string | null
  plan_item_id: string | null
  student_id: string | null
  uploaded_by: string
  shared_with: string | null
  kind: 'take' | 'reference'
  title: string
  storage_key: string
  mime_type: string
  extension: string
  size_bytes: number
  original_name: string
  created_at: Date
  duration_ms: number | null
}

export interface RecordingRecord extends RecordingSummary {
  assignmentId: string | null
  studentId: string | null
  uploadedBy: string
  sharedWithId: string | null
  storageKey: string
  extension: string
}

export const toRecord = (r: RecordingRow): RecordingRecord => ({
  id: r.id,
  assignmentId: r.assignment_id,
  planItemId: r.plan_item_id,
  studentId: r.student_id,
  uploadedBy: r.uploaded_by,
  sharedWithId: r.shared_with,
  kind: r.kind,
  title: r.title,
  storageKey: r.storage_key,
  mimeType: r.mime_type,
  extension: r.extension,
  sizeBytes: r.size_bytes,
  originalName: r.original_name,
  createdAt: r.created_at.toISOString(),
  durationMs: r.duration_ms,
})

export const toSummary = ({
  id,
  planItemId,
  kind,
  title,
  mimeType,
  sizeBytes,
  originalName,
  createdAt,
  durationMs,
}: RecordingRecord): RecordingSummary => ({
  id,
  planItemId,
  kind,
  title,
  mimeType,
  sizeBytes,
  originalName,
  createdAt,
  durationMs,
})

/** A recording to insert: everything but what the database gives it. */
export type NewRecording = Omit<RecordingRecord, 'id' | 'createdAt'>

export async function insertRecording(db: Db, input: NewRecording): Promise<RecordingRecord> {
  const [row] = await db('recordings')
    .insert({
      assignment_id: input.assignmentId,
      plan_item_id: input.planItemId,
      student_id: input.studentId,
      uploaded_by: input.uploadedBy,
      shared_with: input.sharedWithId,
      kind: input.kind,
      title: input.title,
      storage_key: input.storageKey,
      mime_type: input.mimeType,
      extension: input.extension,
      size_bytes: input.sizeBytes,
      original_name: input.originalName,
      duration_ms: input.durationMs,
    })
    .returning('*')
  return toRecord(row as RecordingRow)
}

export async function findRecording(db: Db, id: string): Promise<RecordingRecord | null> {
  const row = await db<RecordingRow>('recordings').where({ id }).first()
  return row ? toRecord(row) : null
}

/**
 * Inserts a recording unless the item already holds `max` of this assignment's: the assignment's
 * row lock queues parallel uploads, so counting and inserting are one step. 'gone' when the
 * assignment was deleted meanwhile.
 */
export function insertRecordingBelowLimit(
  db: Db,
  input: NewRecording & { assignmentId: string; planItemId: string },
  max: number,
): Promise<RecordingRecord | 'full' | 'gone'> {
  return db.transaction(async (trx) => {
    const locked = await trx('plan_assignments')
      .where({ id: input.assignmentId })
      .forUpdate()
      .first('id')
    if (!locked) return 'gone'
    if ((await countItemRecordings(trx, input.assignmentId, input.planItemId)) >= max) return 'full'
    return insertRecording(trx, input)
  })
}

async function countItemRecordings(
  db: Db,
  assignmentId: string,
  planItemId: string,
): Promise<number> {
  const [row] = (await db('recordings')
    .where({ assignment_id: assignmentId, plan_item_id: planItemId })
    .count({ count: '*' })) as [{ count: string }]
  return Number(row.count)
}

/** The teachers' reference takes on these plan items, newest first. */
export async function referencesOfItems(db: Db, itemIds: string[]): Promise<RecordingRecord[]> {
  if (!itemIds.length) return []
  const rows: RecordingRow[] = await db('recordings')
    .whereIn('plan_item_id', itemIds)
    .where({ kind: 'reference' })
    .orderBy('created_at', 'desc')
  return rows.map(toRecord)
}

/** Recordings of several assignments, newest first. */
export async function recordingsOfAssignments(
  db: Db,
  assignmentIds: string[],
): Promise<RecordingRecord[]> {
  if (!assignmentIds.length) return []
  const rows: RecordingRow[] = await db('recordings')
    .whereIn('assignment_id', assignmentIds)
    .orderBy('created_at', 'desc')
  return rows.map(toRecord)
}

export async function deleteRecording(db: Db, id: string) {
  await db('recordings').where({ id }).delete()
}

/** Storage keys of recordings that a delete of these assignments or items would remove. */
export async function storageKeysOf(
  db: Db,
  where: { assignmentIds?: string[]; itemIds?: string[]; planId?: string },
) {
  return db('recordings as r')
    .modify((q) => {
      if (where.assignmentIds) q.whereIn('r.assignment_id', where.assignmentIds)
      if (where.itemIds) q.whereIn('r.plan_item_id', where.itemIds)
      if (where.planId)
        q.join('plan_items as i', 'i.id', 'r.plan_item_id').where('i.plan_id', where.planId)
    })
    .pluck('r.storage_key') as Promise<string[]>
}
