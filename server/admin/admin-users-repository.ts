// Writes an admin's account change needs beyond the users table.
import type { Db } from '../lib/db'

/**
 * Ends a former student's studio memberships (after a promotion): they leave every teacher's
 * roster at once. Returns how many memberships ended.
 */
export async function endStudioMemberships(db: Db, userId: string): Promise<number> {
  return db('studio_members').where({ student_id: userId }).delete()
}

/**
 * Pauses a former teacher's studios (after a demotion): their open invitations are revoked, and
 * the students of their studios are returned so they can be told. Studios, members and plans stay,
 * so promoting the account again opens the studios as they were.
 */
export async function pauseStudios(db: Db, teacherId: string) {
  await db('studio_invitations')
    .whereIn('studio_id', db('studios').select('id').where({ teacher_id: teacherId }))
    .whereNull('accepted_at')
    .whereNull('revoked_at')
    .update({ revoked_at: db.fn.now() })
  const rows: { email: string; name: string; studio_name: string }[] = await db(
    'studio_members as m',
  )
    .join('studios as s', 's.id', 'm.studio_id')
    .join('users as u', 'u.id', 'm.student_id')
    .where('s.teacher_id', teacherId)
    .orderBy(['u.email', 's.name'])
    .select('u.email', 'u.name', 's.name as studio_name')
  return rows.map((r) => ({ email: r.email, name: r.name, studioName: r.studio_name }))
}
