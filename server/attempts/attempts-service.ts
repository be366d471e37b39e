// Recording graded answers: validate ownership, store each attempt once (idempotent on its client
// UUID) and remember the player's time zone; the statistics queue rolls the answers up after.
import type { AppContext } from '../context'
import { badRequest, type FieldErrors } from '../lib/errors'
import type { PublicUser } from '../users/users-schema'
import type { AttemptBatch, AttemptBatchResult } from '../../src/contract/attempts'
import { isKnownTimeZone, reportBrowserTimeZone } from '../users/users-repository'
import * as repo from './attempts-repository'

// PostgreSQL's list of zones is fixed for the life of the process; zones already saved per player
// are remembered so a batch with an unchanged zone costs no extra query.
const knownZones = new Map<string, boolean>()
const savedZones = new Map<string, string>()
// An instrument never changes hands, so "this player owns it" stays true once read; one deleted since
// is caught by the foreign key at insert time. Bounded: forgotten wholesale past the limit.
const ownedInstruments = new Set<string>()
const OWNED_LIMIT = 50_000

async function usableTimeZone(ctx: AppContext, zone: string | undefined) {
  if (!zone) return null
  if (!knownZones.has(zone)) knownZones.set(zone, await isKnownTimeZone(ctx.db, zone))
  return knownZones.get(zone) ? zone : null
}

/** Every instrumentId must be one of the player's own instruments (400 with the offending fields). */
function assertOwnInstruments(batch: AttemptBatch, owned: Set<string>) {
  const fields: FieldErrors = {}
  batch.attempts.forEach((a, i) => {
    if (a.instrumentId && !owned.has(a.instrumentId))
      fields[`attempts.${i}.instrumentId`] = ['This is not one of your instruments.']
  })
  if (Object.keys(fields).length)
    throw badRequest('Some attempts name an instrument that is not yours.', fields)
}

/**
 * Attempts may only count toward plan items assigned to the player. A link to any other item is
 * dropped rather than refused: the answers are still the player's practice (a plan may have been
 * withdrawn while a batch waited offline), so they are kept, just not credited to that plan.
 */
async function keepAssignedPlanItems(
  ctx: AppContext,
  userId: string,
  batch: AttemptBatch,
): Promise<AttemptBatch> {
  const itemIds = [...new Set(batch.attempts.flatMap((a) => (a.planItemId ? [a.planItemId] : [])))]
  if (!itemIds.length) return batch
  const assigned = await repo.assignedPlanItemIds(ctx.db, userId, itemIds)
  const attempts = batch.attempts.map((a) =>
    a.planItemId && !assigned.has(a.planItemId) ? { ...a, planItemId: null } : a,
  )
  return { ...batch, attempts }
}

/** Which of these instrument ids the player owns (ids seen before cost no query). */
async function ownInstruments(ctx: AppContext, userId: string, ids: string[]) {
  const key = (id: string) => `${userId}/${id}`
  const unknown = ids.filter((id) => !ownedInstruments.has(key(id)))
  if (unknown.length) {
    if (ownedInstruments.size > OWNED_LIMIT) ownedInstruments.clear()
    for (const id of await repo.ownedInstrumentIds(ctx.db, userId, unknown))
      ownedInstruments.add(key(id))
  }
  return new Set(ids.filter((id) => ownedInstruments.has(key(id))))
}

/** A foreign-key violation on the instrument (deleted while the batch was on its way). */
const isMissingInstrument = (e: unknown) =>
  (e as { code?: string; constraint?: string }).code === '23503' &&
  String((e as { constraint?: string }).constraint).includes('instrument')

/**
 * Stores a batch for the signed-in player. Ids already stored (a re-sent batch) are skipped, never
 * overwritten, whoever stored them; the answer lists only the rows stored now. The same statement
 * queues the new rows for the statistics and review cards (db/sql/rollup_queue.sql), which the drain
 * applies moments later, each exactly once (see "Statistics" in DEVELOPERS.md).
 */
export async function recordAttempts(
  ctx: AppContext,
  user: PublicUser,
  received: AttemptBatch,
): Promise<AttemptBatchResult> {
  const batch = await keepAssignedPlanItems(ctx, user.id, received)
  const instrumentIds = [
    ...new Set(batch.attempts.flatMap((a) => (a.instrumentId ? [a.instrumentId] : []))),
  ]
  assertOwnInstruments(batch, await ownInstruments(ctx, user.id, instrumentIds))
  const zone = await usableTimeZone(ctx, batch.timeZone)
  if (zone && savedZones.get(user.id) !== zone) {
    await reportBrowserTimeZone(ctx.db, user.id, zone)
    savedZones.set(user.id, zone)
  }
  const rows = await repo.insertNewAttempts(ctx.db, user.id, batch.attempts).catch((e: unknown) => {
    if (isMissingInstrument(e))
      throw badRequest('An instrument of these attempts no longer exists.')
    throw e
  })
  if (rows.length) ctx.statistics.nudge()
  return {
    stored: rows.length,
    duplicates: batch.attempts.length - rows.length,
    attempts: rows.map(repo.toStoredAttempt),
  }
}
