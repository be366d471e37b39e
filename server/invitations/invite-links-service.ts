// Open invitation links: a teacher makes a link for a studio (limited uses, an expiry) to hand out
// in a chat; any student account (or a new one) joins with it while it is open.
import { createHash, randomBytes } from 'node:crypto'
import { publicUrl } from '../config'
import type { AppContext } from '../context'
import { AppError, conflict, forbidden, notFound } from '../lib/errors'
import { insertUser } from '../users/users-repository'
import type { PublicUser } from '../users/users-schema'
import { joinStudio, ownStudio } from '../studios/studios-service'
import type { InvitationPreview, InviteLinkCreateInput } from '../../src/contract/studios'
import * as repo from './invite-links-repository'
import {
  duplicateEmail,
  newStudentAccount,
  refuseNonStudent,
  type AcceptResult,
} from './invitation-accounts'
import type { AcceptInvitationInput } from './invitations-schema'

const DAY_MS = 24 * 3600 * 1000
const sha256 = (value: string) => createHash('sha256').update(value).digest('hex')

/** A new link; its address is answered once (only its hash is kept). */
export async function createLink(
  ctx: AppContext,
  teacherId: string,
  studioId: string,
  input: Required<InviteLinkCreateInput>,
) {
  await ownStudio(ctx, teacherId, studioId)
  const token = randomBytes(32).toString('base64url')
  const id = await repo.insertLink(ctx.db, {
    studioId,
    tokenHash: sha256(token),
    createdBy: teacherId,
    maxUses: input.maxUses,
    expiresAt: new Date(Date.now() + input.days * DAY_MS),
  })
  const url = `${publicUrl(ctx.config)}/invitations/accept?token=${encodeURIComponent(token)}`
  return { link: repo.toInviteLink((await repo.findLink(ctx.db, id))!), url }
}

export const listLinks = (ctx: AppContext, teacherId: string) => repo.listLinks(ctx.db, teacherId)

export async function revokeLink(ctx: AppContext, teacherId: string, id: string) {
  const link = await repo.findLink(ctx.db, id)
  if (!link) throw notFound('That link')
  if (link.teacherId !== teacherId) throw forbidden('This link belongs to another teacher.')
  if (!(await repo.revokeLink(ctx.db, id))) throw conflict('This link was already withdrawn.')
  return repo.toInviteLink((await repo.findLink(ctx.db, id))!)
}

const UNUSABLE: Record<string, string> = {
  revoked: 'This link was withdrawn by the teacher.',
  expired: 'This link has expired.',
  'used-up': 'This link has been used as many times as the teacher allowed.',
}

/** The open link behind a token hash; null when the token is not a link's (410 when closed). */
async function usableLink(ctx: AppContext, tokenHash: string) {
  const link = await repo.findLinkByToken(ctx.db, tokenHash)
  const reason = link && UNUSABLE[link.status]
  if (reason)
    throw new AppError('invitation_unusable', `${reason} Ask your teacher for a new one.`, 410)
  return link
}

export async function previewLink(
  ctx: AppContext,
  tokenHash: string,
): Promise<InvitationPreview | null> {
  const link = await usableLink(ctx, tokenHash)
  if (!link) return null
  const { studioName, teacherName, expiresAt } = link
  return { studioName, teacherName, email: null, expiresAt, accountExists: false }
}

/** Joins with an open link (signed in as a student, or a new account); null when not a link. */
export async function acceptLink(
  ctx: AppContext,
  tokenHash: string,
  input: AcceptInvitationInput,
  current: PublicUser | null,
): Promise<AcceptResult | null> {
  const link = await usableLink(ctx, tokenHash)
  if (!link) return null
  if (current) refuseNonStudent(current)
  const account = current ? null : await newStudentAccount(ctx, input.email, input)
  return ctx.db.transaction(async (trx) => {
    const created = account ? await insertUser(trx, account).catch(duplicateEmail) : null
    const studentId = current?.id ?? created!.id
    const { joined, sharesFrom } = await joinStudio(
      trx,
      link.studioId,
      studentId,
      input.shareHistory,
    )
    // A use counts only for someone who joined; the join is undone when the link closed meanwhile.
    if (joined && !(await repo.consumeLinkUse(trx, link.id)))
      throw new AppError(
        'invitation_unusable',
        'This link was used up or withdrawn a moment ago.',
        410,
      )
    const { studioId, studioName } = link
    return {
      created,
      studioId,
      studioName,
      alreadyMember: !joined,
      sharesFrom: joined ? sharesFrom : null,
    }
  })
}
