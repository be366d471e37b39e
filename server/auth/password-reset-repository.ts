// Password reset tokens: only their SHA-256 hash is stored; each is single-use and expires.
import type { Db } from '../lib/db'

export async function insertReset(db: Db, userId: string, tokenHash: string, expiresAt: Date) {
  await db('password_resets').insert({
    user_id: userId,
    token_hash: tokenHash,
    expires_at: expiresAt,
  })
}

/** Marks a valid, unused token as used and returns its user id; null when not usable. */
export async function consumeReset(db: Db, tokenHash: string): Promise<string | null> {
  const [row] = await db('password_resets')
    .where({ token_hash: tokenHash })
    .whereNull('used_at')
    .where('expires_at', '>', db.fn.now())
    .update({ used_at: db.fn.now() })
    .returning('user_id')
  return (row as { user_id: string } | undefined)?.user_id ?? null
}

/** Voids every other open token of the user (after a successful reset). */
export async function voidResets(db: Db, userId: string) {
  await db('password_resets')
    .where({ user_id: userId })
    .whereNull('used_at')
    .update({ used_at: db.fn.now() })
}
