// Writes an admin's account change needs beyond the users table.
import type { Db } from '../lib/db'

/**
 * Ends a former student's studio memberships (after a promotion): they leave every teacher's
 * roster at once. Returns how many memberships ended.
 */
export async function endStudioMemberships(db: Db, userId: string): Promise<number> {
  return db('studio_members').where({ student_id: userId }).delete()
}
