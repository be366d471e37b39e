// The answers waiting to be sent, kept in IndexedDB (Dexie), one queue per player, so a reload, a
// closed tab or a day without network loses nothing. A queue that earlier versions kept in
// localStorage is moved over once. Only the attempts store imports this; Dexie itself loads with the
// first queue access, so a drill page's first question does not wait for it.
import type Dexie from 'dexie'
import type { EntityTable } from 'dexie'
import type { AttemptInput } from '../api/attempts'

interface QueuedAttempt {
  id: string
  owner: string
  /** Microseconds since the epoch plus a counter: the order answers were given in. */
  queuedAt: number
  attempt: AttemptInput
}

type QueueDb = Dexie & { attempts: EntityTable<QueuedAttempt, 'id'> }

const LEGACY_PREFIX = 'ambitus.attempts.v1.'
let queue: Promise<{ db: QueueDb; keys: typeof Dexie }> | null = null
let counter = 0

function database() {
  queue ??= import('dexie').then(({ default: Database }) => {
    const db = new Database('ambitus-attempts') as QueueDb
    db.version(1).stores({ attempts: 'id, [owner+queuedAt]' })
    return { db, keys: Database }
  })
  return queue
}

/** Adds answers to a player's queue (an id already queued is overwritten, never doubled). */
export async function saveAttempts(owner: string, attempts: AttemptInput[]) {
  const now = Date.now() * 1000
  const rows = attempts.map((attempt) => ({
    id: attempt.id,
    owner,
    queuedAt: now + (counter++ % 1000),
    attempt,
  }))
  await (await database()).db.attempts.bulkPut(rows)
}

/** Removes answers (sent, or refused by the server) from every queue. */
export async function removeAttempts(ids: string[]) {
  await (await database()).db.attempts.bulkDelete(ids)
}

/** A player's queued answers, oldest first; adopts a localStorage queue left by earlier versions. */
export async function loadAttempts(owner: string): Promise<AttemptInput[]> {
  await adoptLegacyQueue(owner)
  const { db, keys } = await database()
  const rows = await db.attempts
    .where('[owner+queuedAt]')
    .between([owner, keys.minKey], [owner, keys.maxKey])
    .toArray()
  return rows.map((row) => row.attempt)
}

async function adoptLegacyQueue(owner: string) {
  const key = `${LEGACY_PREFIX}${owner}`
  let legacy: unknown
  try {
    legacy = JSON.parse(localStorage.getItem(key) ?? 'null')
  } catch {
    legacy = null // unreadable: nothing to adopt
  }
  if (Array.isArray(legacy) && legacy.length) await saveAttempts(owner, legacy as AttemptInput[])
  localStorage.removeItem(key)
}
