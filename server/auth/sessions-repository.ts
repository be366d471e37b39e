// Server-side sessions: one row per signed-in browser; deleting the row ends the session.
import type { Db } from '../lib/db'
import { toRecord, type UserRecord, type UserRow } from '../users/users-repository'

export async function insertSession(db: Db, userId: string, expiresAt: Date): Promise<string> {
  // Expired rows of this user go with the next sign-in, so the table does not grow without end.
  await db('sessions').where({ user_id: userId }).where('expires_at', '<=', db.fn.now()).delete()
  const [row] = await db('sessions')
    .insert({ user_id: userId, expires_at: expiresAt })
    .returning('id')
  return (row as { id: string }).id
}

/** The user of a live session of an enabled account: one primary-key join per request. */
export async function findSessionUser(
  db: Db,
  sessionId: string,
  userId: string,
): Promise<UserRecord | null> {
  const row: UserRow | undefined = await db('sessions as s')
    .join('users as u', 'u.id', 's.user_id')
    .where({ 's.id': sessionId, 's.user_id': userId })
    .where('s.expires_at', '>', db.fn.now())
    .whereNull('u.disabled_at')
    .first('u.*')
  return row ? toRecord(row) : null
}

export async function deleteSession(db: Db, sessionId: string) {
  await db('sessions').where({ id: sessionId }).delete()
}

/** Ends every session of a user, or every one but `keep` (the browser that asked). */
export async function deleteUserSessions(db: Db, userId: string, keep?: string) {
  await db('sessions')
    .where({ user_id: userId })
    .modify((q) => {
      if (keep) q.whereNot({ id: keep })
    })
    .delete()
}
