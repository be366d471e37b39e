// notification_log: what scheduled mail was sent, so a restart or a second process never resends.
import type { Db } from '../lib/db'

/** Claims (kind, key) before sending; false when it was already claimed. */
export async function claimNotification(
  db: Db,
  kind: string,
  key: string,
  recipient: string,
): Promise<boolean> {
  const rows = await db('notification_log')
    .insert({ kind, key, recipient })
    .onConflict(['kind', 'key'])
    .ignore()
    .returning('id')
  return rows.length > 0
}

/** Gives a claim back after a failed send, so the next run tries again. */
export async function releaseNotification(db: Db, kind: string, key: string) {
  await db('notification_log').where({ kind, key }).delete()
}
