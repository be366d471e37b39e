// Studios and their members (memberships from the student's side).
import type { Knex } from 'knex'
import type { Db } from '../lib/db'
import type { Membership, Studio } from '../../src/contract/studios'

interface StudioRow {
  id: string
  teacher_id: string
  name: string
  created_at: Date
}

export interface StudioRecord {
  id: string
  teacherId: string
  name: string
}

export async function listStudios(db: Db, teacherId: string): Promise<Studio[]> {
  const rows: (StudioRow & { student_count: string; pending: string })[] = await db('studios as s')
    .where('s.teacher_id', teacherId)
    .select('s.*')
    .select(db('studio_members as m').count('*').whereRaw('m.studio_id = s.id').as('student_count'))
    .select(
      db('studio_invitations as i')
        .count('*')
        .whereRaw('i.studio_id = s.id')
        .whereNull('i.accepted_at')
        .whereNull('i.revoked_at')
        .where('i.expires_at', '>', db.fn.now())
        .as('pending'),
    )
    .orderBy('s.created_at')
  return rows.map((r) => ({
    id: r.id,
    name: r.name,
    createdAt: r.created_at.toISOString(),
    studentCount: Number(r.student_count),
    pendingInvitations: Number(r.pending),
  }))
}

export async function findStudio(db: Db, studioId: string): Promise<StudioRecord | null> {
  const row = await db<StudioRow>('studios').where({ id: studioId }).first()
  return row ? { id: row.id, teacherId: row.teacher_id, name: row.name } : null
}

export async function insertStudio(db: Db, teacherId: string, name: string): Promise<string> {
  const [row] = await db('studios').insert({ teacher_id: teacherId, name }).returning('id')
  return (row as { id: string }).id
}

export async function renameStudio(db: Db, studioId: string, name: string) {
  await db('studios').where({ id: studioId }).update({ name, updated_at: db.fn.now() })
}

export async function deleteStudio(db: Db, studioId: string) {
  await db('studios').where({ id: studioId }).delete()
}

export async function countMembers(db: Db, studioId: string): Promise<number> {
  const [row] = (await db('studio_members')
    .where({ studio_id: studioId })
    .count({ count: '*' })) as [{ count: string }]
  return Number(row.count)
}

/** Adds a student to a studio (sharing practice from `sharesFrom`); false when already in it. */
export async function addMember(
  db: Db | Knex.Transaction,
  studioId: string,
  studentId: string,
  sharesFrom: Date | null = null,
): Promise<boolean> {
  const rows = await db('studio_members')
    .insert({ studio_id: studioId, student_id: studentId, shares_from: sharesFrom })
    .onConflict(['studio_id', 'student_id'])
    .ignore()
    .returning('student_id')
  return rows.length > 0
}

/** Removes a student from a studio; false when they were not in it. */
export async function removeMember(db: Db, studioId: string, studentId: string): Promise<boolean> {
  return (
    (await db('studio_members').where({ studio_id: studioId, student_id: studentId }).delete()) > 0
  )
}

export async function memberships(db: Db, studentId: string): Promise<Membership[]> {
  const rows: {
    studio_id: string
    studio_name: string
    teacher_name: string
    joined_at: Date
    shares_from: Date | null
  }[] = await db('studio_members as m')
    .join('studios as s', 's.id', 'm.studio_id')
    .join('users as t', 't.id', 's.teacher_id')
    .where('m.student_id', studentId)
    .select('m.studio_id', 's.name as studio_name', 't.name as teacher_name', 'm.joined_at')
    .select('m.shares_from')
    .orderBy('m.joined_at')
  return rows.map((r) => ({
    studioId: r.studio_id,
    studioName: r.studio_name,
    teacherName: r.teacher_name,
    joinedAt: r.joined_at.toISOString(),
    sharesFrom: r.shares_from?.toISOString() ?? null,
  }))
}

/** How many studios the student is in. */
export async function studioCountOf(db: Db | Knex.Transaction, studentId: string): Promise<number> {
  const [row] = (await db('studio_members')
    .where({ student_id: studentId })
    .count({ count: '*' })) as [{ count: string }]
  return Number(row.count)
}

/** Whether the e-mail already belongs to a member of the studio. */
export async function isMemberEmail(db: Db, studioId: string, email: string): Promise<boolean> {
  const row = await db('studio_members as m')
    .join('users as u', 'u.id', 'm.student_id')
    .where({ 'm.studio_id': studioId, 'u.email': email })
    .first('u.id')
  return Boolean(row)
}
