// Messages and their recipients: the only place that knows these tables.
import type { Db } from '../lib/db'
import type { MessageRecipient, ReceivedMessage, SentMessage } from '../../src/contract/messages'

export interface NewMessage {
  teacherId: string
  studioId: string | null
  audience: 'students' | 'studio'
  subject: string
  body: string
  emailed: boolean
  studentIds: string[]
}

/** Stores the message and one unread row per recipient in one transaction; answers its id. */
export async function insertMessage(db: Db, m: NewMessage): Promise<string> {
  return db.transaction(async (trx) => {
    const [row] = (await trx('messages')
      .insert({
        teacher_id: m.teacherId,
        studio_id: m.studioId,
        audience: m.audience,
        subject: m.subject,
        body: m.body,
        emailed: m.emailed,
      })
      .returning('id')) as { id: string }[]
    await trx('message_recipients').insert(
      m.studentIds.map((id) => ({ message_id: row!.id, student_id: id })),
    )
    return row!.id
  })
}

interface SentRow {
  id: string
  subject: string
  body: string
  audience: 'students' | 'studio'
  studio_name: string | null
  emailed: boolean
  created_at: Date
  recipients: { studentId: string; name: string; readAt: string | null }[]
}

const iso = (at: Date | string | null) => (at === null ? null : new Date(at).toISOString())

/** The teacher's messages, newest first (or the ones named), each with its recipients by name. */
export async function sentMessages(
  db: Db,
  teacherId: string,
  ids?: string[],
): Promise<SentMessage[]> {
  const rows: SentRow[] = await db('messages as m')
    .leftJoin('studios as s', 's.id', 'm.studio_id')
    .join('message_recipients as r', 'r.message_id', 'm.id')
    .join('users as u', 'u.id', 'r.student_id')
    .where('m.teacher_id', teacherId)
    .modify((q) => void (ids ? q.whereIn('m.id', ids) : q))
    .groupBy('m.id', 's.name')
    .orderBy('m.created_at', 'desc')
    .select('m.id', 'm.subject', 'm.body', 'm.audience', 'm.emailed', 'm.created_at')
    .select('s.name as studio_name')
    .select(
      db.raw(
        `json_agg(json_build_object('studentId', u.id, 'name', u.name, 'readAt', r.read_at)
           order by u.name) as recipients`,
      ),
    )
  return rows.map((r) => ({
    id: r.id,
    subject: r.subject,
    body: r.body,
    audience: r.audience,
    studioName: r.studio_name,
    emailed: r.emailed,
    createdAt: iso(r.created_at)!,
    recipients: r.recipients.map((p): MessageRecipient => ({ ...p, readAt: iso(p.readAt) })),
  }))
}

interface ReceivedRow {
  id: string
  subject: string
  body: string
  created_at: Date
  read_at: Date | null
  teacher_name: string
  studio_name: string | null
}

/** A student's messages, newest first (or the one named). */
export async function receivedMessages(
  db: Db,
  studentId: string,
  id?: string,
): Promise<ReceivedMessage[]> {
  const rows: ReceivedRow[] = await db('message_recipients as r')
    .join('messages as m', 'm.id', 'r.message_id')
    .join('users as t', 't.id', 'm.teacher_id')
    .leftJoin('studios as s', 's.id', 'm.studio_id')
    .where('r.student_id', studentId)
    .modify((q) => void (id ? q.where('m.id', id) : q))
    .orderBy('m.created_at', 'desc')
    .select('m.id', 'm.subject', 'm.body', 'm.created_at', 'r.read_at')
    .select('t.name as teacher_name', 's.name as studio_name')
  return rows.map((r) => ({
    id: r.id,
    subject: r.subject,
    body: r.body,
    teacherName: r.teacher_name,
    studioName: r.studio_name,
    createdAt: iso(r.created_at)!,
    readAt: iso(r.read_at),
  }))
}

/** Marks the student's copy read (once: the first reading counts); false when not theirs. */
export async function markRead(db: Db, messageId: string, studentId: string): Promise<boolean> {
  const row = await db('message_recipients')
    .where({ message_id: messageId, student_id: studentId })
    .update({ read_at: db.raw('coalesce(read_at, now())') })
  return row > 0
}

export async function messageOwner(db: Db, id: string): Promise<string | null> {
  const row = (await db('messages').where({ id }).first('teacher_id')) as
    { teacher_id: string } | undefined
  return row?.teacher_id ?? null
}

export const deleteMessage = (db: Db, id: string) => db('messages').where({ id }).delete()
