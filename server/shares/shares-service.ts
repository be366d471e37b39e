// Shared exercise use cases: make a link, read it without an account, list and revoke one's own.
import { randomBytes } from 'node:crypto'
import type { AppContext } from '../context'
import { AppError, badRequest, conflict, forbidden, notFound } from '../lib/errors'
import { tuningErrors } from '../../src/theory'
import {
  MAX_OPEN_SHARES,
  type ShareCreate,
  type SharedExercise,
  type ShareLink,
} from '../../src/contract/shares'
import type { PublicUser } from '../../src/contract/users'
import {
  countOpenShares,
  findShare,
  insertShare,
  listShares,
  revokeShare,
  type StoredShare,
} from './shares-repository'

const withoutOwner = ({ ownerId: _owner, ...share }: StoredShare): ShareLink => share
const publicView = ({ revokedAt: _revoked, ...share }: ShareLink): SharedExercise => share

/** Stores the exercise behind a fresh unguessable token (128 random bits). */
export async function createShare(
  ctx: AppContext,
  user: PublicUser,
  share: ShareCreate,
): Promise<ShareLink> {
  const problems = tuningErrors(share.instrument.tuning, share.instrument.frets)
  if (problems.length > 0) throw badRequest(problems.join(' '), { 'instrument.tuning': problems })
  if ((await countOpenShares(ctx.db, user.id)) >= MAX_OPEN_SHARES)
    throw conflict(`You have ${MAX_OPEN_SHARES} open links; revoke some before sharing more.`)
  const token = randomBytes(16).toString('base64url')
  await insertShare(ctx.db, user.id, token, share)
  return withoutOwner((await findShare(ctx.db, token)) as StoredShare)
}

/** What anyone with the link sees; a revoked link is gone (410), an unknown one not found. */
export async function readShare(ctx: AppContext, token: string): Promise<SharedExercise> {
  const share = await findShare(ctx.db, token)
  if (!share) throw notFound('This shared exercise')
  if (share.revokedAt)
    throw new AppError('gone', 'Whoever shared this exercise has withdrawn the link.', 410)
  return publicView(withoutOwner(share))
}

export async function listMyShares(ctx: AppContext, user: PublicUser): Promise<ShareLink[]> {
  return (await listShares(ctx.db, user.id, MAX_OPEN_SHARES)).map(withoutOwner)
}

/** The owner (or an admin) revokes a link; revoking twice changes nothing. */
export async function revokeMyShare(ctx: AppContext, user: PublicUser, token: string) {
  const share = await findShare(ctx.db, token)
  if (!share) throw notFound('This shared exercise')
  if (share.ownerId !== user.id && user.role !== 'admin')
    throw forbidden('Only whoever shared this exercise can revoke its link.')
  await revokeShare(ctx.db, token)
}
