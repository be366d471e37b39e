// Recordings outside the assignment routes: free takes and reference takes with the names around
// them, title and sharing changes, who a student's teachers are, and pinned comments.
import type { Db } from '../lib/db'
import type { PinnedComment, RecordingEntry } from '../../src/contract/recordings'
import {
  toRecord,
  toSummary,
  type RecordingRecord,
  type RecordingRow,
} from '../assignments/recordings-repository'

type EntryRow = RecordingRow & {
  student_name: string | null
  author_name: string
  shared_name: string | null
  plan_title: string | null
  comment_count: string
}

function entryQuery(db: Db) {
  return db('recordings as r')
    .leftJoin('users as s', 's.id', 'r.student_id')
    .join('users as a', 'a.id', 'r.uploaded_by')
    .leftJoin('users as t', 't.id', 'r.shared_with')
    .leftJoin('plan_items as i', 'i.id', 'r.plan_item_id')
    .leftJoin('plans as p', 'p.id', 'i.plan_id')
    .select('r.*', 's.name as student_name', 'a.name as author_name', 't.name as shared_name')
    .select('p.title as plan_title')
    .select(
      db.raw(
        '(select count(*) from recording_comments c where c.recording_id = r.id) as comment_count',
      ),
    )
}

const toEntry = (r: EntryRow): RecordingEntry & RecordingRecord => {
  const record = toRecord(r)
  return {
    ...record,
    student: r.student_id ? { id: r.student_id, name: r.student_name ?? '' } : null,
    author: { id: r.uploaded_by, name: r.author_name },
    sharedWith: r.shared_with ? { id: r.shared_with, name: r.shared_name ?? '' } : null,
    planItem: r.plan_item_id ? { id: r.plan_item_id, planTitle: r.plan_title ?? '' } : null,
    commentCount: Number(r.comment_count),
  }
}

/** What a list shows of a recording (no storage key, no uploader internals). */
export const toPublicEntry = (e: RecordingEntry & RecordingRecord): RecordingEntry => ({
  ...toSummary(e),
  ...{ student: e.student, author: e.author, sharedWith: e.sharedWith, planItem: e.planItem },
  commentCount: e.commentCount,
})

export async function findEntry(db: Db, id: string) {
  const row = (await entryQuery(db).where('r.id', id).first()) as EntryRow | undefined
  return row ? toEntry(row) : null
}

/** A student's free takes and the references made for them, newest first. */
export async function studentEntries(db: Db, studentId: string) {
  const rows: EntryRow[] = await entryQuery(db)
    .where('r.student_id', studentId)
    .where((q) => q.where('r.kind', 'reference').orWhereNull('r.assignment_id'))
    .orderBy('r.created_at', 'desc')
  return rows.map(toEntry)
}

/** Free takes shared with the teacher by students of their studios, and the teacher's references. */
export async function teacherEntries(db: Db, teacherId: string, studentId?: string) {
  const rows: EntryRow[] = await entryQuery(db)
    .where((q) =>
      q
        .where((own) => own.where('r.kind', 'reference').where('r.uploaded_by', teacherId))
        .orWhere((shared) =>
          shared
            .where({ 'r.kind': 'take', 'r.shared_with': teacherId })
            .whereNull('r.assignment_id')
            .whereIn('r.student_id', studentsOf(db, teacherId)),
        ),
    )
    .modify((q) => {
      if (studentId) q.where('r.student_id', studentId)
    })
    .orderBy('r.created_at', 'desc')
  return rows.map(toEntry)
}

const studentsOf = (db: Db, teacherId: string) =>
  db('studio_members as m')
    .join('studios as st', 'st.id', 'm.studio_id')
    .where('st.teacher_id', teacherId)
    .select('m.student_id')

/** The teachers of the student's studios, each once, by name. */
export async function teachersOfStudent(db: Db, studentId: string) {
  const rows: { id: string; name: string }[] = await db('studio_members as m')
    .join('studios as st', 'st.id', 'm.studio_id')
    .join('users as u', 'u.id', 'st.teacher_id')
    .where({ 'm.student_id': studentId, 'u.role': 'teacher' })
    .distinct('u.id', 'u.name')
    .orderBy('u.name')
  return rows
}

/** Whether the teacher (still a teacher's account) has the student in one of their studios. */
export async function isTeacherOf(db: Db, teacherId: string, studentId: string) {
  return (await teachersOfStudent(db, studentId)).some((t) => t.id === teacherId)
}

/** The plan item, when it belongs to a plan of this teacher. */
export async function teachersItem(db: Db, teacherId: string, itemId: string) {
  const row = await db('plan_items as i')
    .join('plans as p', 'p.id', 'i.plan_id')
    .where({ 'i.id': itemId, 'p.teacher_id': teacherId })
    .first('i.id')
  return row !== undefined
}

/** Whether the student is assigned the plan this item belongs to. */
export async function studentHasItem(db: Db, studentId: string, itemId: string) {
  const row = await db('plan_items as i')
    .join('plan_assignments as a', 'a.plan_id', 'i.plan_id')
    .where({ 'i.id': itemId, 'a.student_id': studentId })
    .first('i.id')
  return row !== undefined
}

/** How many takes of this kind the user uploaded outside plan items' assignment threads. */
export async function countUploads(db: Db, userId: string, kind: 'take' | 'reference') {
  const [row] = (await db('recordings')
    .where({ uploaded_by: userId, kind })
    .whereNull('assignment_id')
    .count({ n: '*' })) as [{ n: string }]
  return Number(row.n)
}

export async function updateRecording(
  db: Db,
  id: string,
  patch: { title?: string; sharedWith?: string | null },
) {
  const row: Record<string, unknown> = {}
  if (patch.title !== undefined) row.title = patch.title
  if (patch.sharedWith !== undefined) row.shared_with = patch.sharedWith
  await db('recordings').where({ id }).update(row)
}

interface CommentRow {
  id: string
  recording_id: string
  at_ms: number
  body: string
  created_at: Date
  author_id: string
  author_name: string
  author_role: 'teacher' | 'student'
}

const toComment = (r: CommentRow): PinnedComment => ({
  id: r.id,
  recordingId: r.recording_id,
  atMs: r.at_ms,
  body: r.body,
  author: { id: r.author_id, name: r.author_name, role: r.author_role },
  createdAt: r.created_at.toISOString(),
})

const commentQuery = (db: Db) =>
  db('recording_comments as c')
    .join('users as u', 'u.id', 'c.author_id')
    .select('c.*', 'u.name as author_name', 'u.role as author_role')

/** The comments pinned to a take, in the order of their moments. */
export async function commentsOf(db: Db, recordingId: string) {
  const rows: CommentRow[] = await commentQuery(db)
    .where('c.recording_id', recordingId)
    .orderBy([{ column: 'c.at_ms' }, { column: 'c.created_at' }])
  return rows.map(toComment)
}

export async function insertComment(
  db: Db,
  input: { recordingId: string; authorId: string; atMs: number; body: string },
) {
  const [{ id }] = (await db('recording_comments')
    .insert({
      recording_id: input.recordingId,
      author_id: input.authorId,
      at_ms: input.atMs,
      body: input.body,
    })
    .returning('id')) as [{ id: string }]
  const row = (await commentQuery(db).where('c.id', id).first()) as CommentRow
  return toComment(row)
}

export async function findComment(db: Db, recordingId: string, commentId: string) {
  return (await db('recording_comments')
    .where({ id: commentId, recording_id: recordingId })
    .first('id', 'author_id')) as { id: string; author_id: string } | undefined
}

export const deleteComment = (db: Db, id: string) => db('recording_comments').where({ id }).delete()
