// Open invitation links: only the SHA-256 of each token is stored; uses are counted atomically.
import type { Knex } from 'knex'
import type { Db } from '../lib/db'
import type { InviteLink } from '../../src/contract/studios'
import { invitingStudio, type InvitingStudioRow } from './inviting-studio'

interface LinkRow extends InvitingStudioRow {
  id: string
  max_uses: number
  uses: number
  expires_at: Date
  revoked_at: Date | null
  created_at: Date
}

export interface InviteLinkRecord extends InviteLink {
  teacherId: string
  teacherName: string
}

function statusOf(row: LinkRow, now: Date): InviteLink['status'] {
  if (row.revoked_at) return 'revoked'
  if (row.uses >= row.max_uses) return 'used-up'
  return row.expires_at.getTime() <= now.getTime() ? 'expired' : 'open'
}

const toRecord = (row: LinkRow, now = new Date()): InviteLinkRecord => ({
  id: row.id,
  ...invitingStudio(row),
  maxUses: row.max_uses,
  uses: row.uses,
  status: statusOf(row, now),
  expiresAt: row.expires_at.toISOString(),
  createdAt: row.created_at.toISOString(),
})

export const toInviteLink = ({
  teacherId: _t,
  teacherName: _n,
  ...link
}: InviteLinkRecord): InviteLink => link

const linkQuery = (db: Db | Knex.Transaction) =>
  db('studio_invite_links as l')
    .join('studios as s', 's.id', 'l.studio_id')
    .join('users as t', 't.id', 's.teacher_id')
    .select('l.*', 's.name as studio_name', 's.teacher_id', 't.name as teacher_name')

export async function insertLink(
  db: Db,
  input: {
    studioId: string
    tokenHash: string
    createdBy: string
    maxUses: number
    expiresAt: Date
  },
): Promise<string> {
  const [row] = (await db('studio_invite_links')
    .insert({
      studio_id: input.studioId,
      token_hash: input.tokenHash,
      created_by: input.createdBy,
      max_uses: input.maxUses,
      expires_at: input.expiresAt,
    })
    .returning('id')) as { id: string }[]
  return row!.id
}

export async function findLink(db: Db, id: string): Promise<InviteLinkRecord | null> {
  const row = (await linkQuery(db).where('l.id', id).first()) as LinkRow | undefined
  return row ? toRecord(row) : null
}

export async function findLinkByToken(db: Db, tokenHash: string) {
  const row = (await linkQuery(db).where('l.token_hash', tokenHash).first()) as LinkRow | undefined
  return row ? toRecord(row) : null
}

/** The teacher's links, newest first. */
export async function listLinks(db: Db, teacherId: string): Promise<InviteLink[]> {
  const rows: LinkRow[] = await linkQuery(db)
    .where('s.teacher_id', teacherId)
    .orderBy('l.created_at', 'desc')
  return rows.map((r) => toInviteLink(toRecord(r)))
}

export async function revokeLink(db: Db, id: string): Promise<boolean> {
  return (
    (await db('studio_invite_links')
      .where({ id })
      .whereNull('revoked_at')
      .update({ revoked_at: db.fn.now() })) > 0
  )
}

/** Takes one use of a link still open; false when it was used up, withdrawn or expired meanwhile. */
export async function consumeLinkUse(trx: Knex.Transaction, id: string): Promise<boolean> {
  const changed = await trx('studio_invite_links')
    .where({ id })
    .whereNull('revoked_at')
    .where('expires_at', '>', trx.fn.now())
    .whereRaw('uses < max_uses')
    .update({ uses: trx.raw('uses + 1') })
  return changed > 0
}
