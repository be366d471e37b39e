// Studio invitations: only the SHA-256 of each token is stored; a token works once, until it expires.
import type { Knex } from 'knex'
import type { Db } from '../lib/db'
import type { Invitation, InvitationStatus } from '../../src/contract/studios'
import { invitingStudio, type InvitingStudioRow } from './inviting-studio'

interface InvitationRow extends InvitingStudioRow {
  id: string
  email: string
  message: string | null
  expires_at: Date
  sent_at: Date
  send_count: number
  accepted_at: Date | null
  revoked_at: Date | null
  created_at: Date
}

export interface InvitationRecord extends Invitation {
  teacherId: string
  teacherName: string
}

function statusOf(row: InvitationRow, now: Date): InvitationStatus {
  if (row.accepted_at) return 'accepted'
  if (row.revoked_at) return 'revoked'
  return row.expires_at.getTime() <= now.getTime() ? 'expired' : 'pending'
}

const toRecord = (row: InvitationRow, now = new Date()): InvitationRecord => ({
  id: row.id,
  ...invitingStudio(row),
  email: row.email,
  message: row.message,
  status: statusOf(row, now),
  expiresAt: row.expires_at.toISOString(),
  sentAt: row.sent_at.toISOString(),
  sendCount: row.send_count,
  acceptedAt: row.accepted_at ? row.accepted_at.toISOString() : null,
  createdAt: row.created_at.toISOString(),
})

export const toInvitation = ({
  teacherId: _t,
  teacherName: _n,
  ...invitation
}: InvitationRecord): Invitation => invitation

function invitationQuery(db: Db | Knex.Transaction) {
  return db('studio_invitations as i')
    .join('studios as s', 's.id', 'i.studio_id')
    .join('users as t', 't.id', 's.teacher_id')
    .select('i.*', 's.name as studio_name', 's.teacher_id', 't.name as teacher_name')
}

export async function insertInvitation(
  db: Db,
  input: {
    studioId: string
    email: string
    message: string | null
    tokenHash: string
    invitedBy: string
    expiresAt: Date
  },
): Promise<string> {
  const [row] = await db('studio_invitations')
    .insert({
      studio_id: input.studioId,
      email: input.email,
      message: input.message,
      token_hash: input.tokenHash,
      invited_by: input.invitedBy,
      expires_at: input.expiresAt,
    })
    .returning('id')
  return (row as { id: string }).id
}

export async function findInvitation(db: Db, id: string): Promise<InvitationRecord | null> {
  const row = (await invitationQuery(db).where('i.id', id).first()) as InvitationRow | undefined
  return row ? toRecord(row) : null
}

/** The open (not accepted, not revoked) invitation of an address to a studio, expired or not. */
export async function findOpenInvitation(
  db: Db,
  studioId: string,
  email: string,
): Promise<InvitationRecord | null> {
  const row = (await invitationQuery(db)
    .where({ 'i.studio_id': studioId, 'i.email': email })
    .whereNull('i.accepted_at')
    .whereNull('i.revoked_at')
    .first()) as InvitationRow | undefined
  return row ? toRecord(row) : null
}

export async function findInvitationByToken(
  db: Db | Knex.Transaction,
  tokenHash: string,
): Promise<InvitationRecord | null> {
  const row = (await invitationQuery(db).where('i.token_hash', tokenHash).first()) as
    InvitationRow | undefined
  return row ? toRecord(row) : null
}

export async function listInvitations(
  db: Db,
  teacherId: string,
  filter: { studioId?: string; openOnly: boolean },
) {
  const rows: InvitationRow[] = await invitationQuery(db)
    .where('s.teacher_id', teacherId)
    .modify((q) => {
      if (filter.studioId) q.where('i.studio_id', filter.studioId)
      if (filter.openOnly) q.whereNull('i.accepted_at').whereNull('i.revoked_at')
    })
    .orderBy('i.sent_at', 'desc')
  return rows.map((row) => toInvitation(toRecord(row)))
}

/** A new token and expiry (and a new note, when given) for an open invitation (the old link stops working). */
export async function renewInvitation(
  db: Db,
  id: string,
  tokenHash: string,
  expiresAt: Date,
  message?: string,
): Promise<boolean> {
  const changed = await db('studio_invitations')
    .where({ id })
    .whereNull('accepted_at')
    .whereNull('revoked_at')
    .update({
      token_hash: tokenHash,
      expires_at: expiresAt,
      sent_at: db.fn.now(),
      send_count: db.raw('send_count + 1'),
      ...(message ? { message } : {}),
    })
  return changed > 0
}

export async function revokeInvitation(db: Db, id: string): Promise<boolean> {
  const changed = await db('studio_invitations')
    .where({ id })
    .whereNull('accepted_at')
    .whereNull('revoked_at')
    .update({ revoked_at: db.fn.now() })
  return changed > 0
}

/** Marks a usable invitation accepted by a user; false when it was used, revoked or expired meanwhile. */
export async function consumeInvitation(
  trx: Knex.Transaction,
  id: string,
  userId: string,
): Promise<boolean> {
  const changed = await trx('studio_invitations')
    .where({ id })
    .whereNull('accepted_at')
    .whereNull('revoked_at')
    .where('expires_at', '>', trx.fn.now())
    .update({ accepted_at: trx.fn.now(), accepted_by: userId })
  return changed > 0
}
