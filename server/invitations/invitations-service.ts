// Invitation use cases: invite (or re-invite), resend, revoke, preview and accept.
import { createHash, randomBytes } from 'node:crypto'
import { publicUrl } from '../config'
import type { AppContext } from '../context'
import { AppError, conflict, forbidden, notFound } from '../lib/errors'
import { findUserByEmail, insertUser, timeZoneOf, type UserRecord } from '../users/users-repository'
import type { PublicUser } from '../users/users-schema'
import {
  consumeInvitation,
  findInvitation,
  findInvitationByToken,
  findOpenInvitation,
  insertInvitation,
  listInvitations as listRows,
  renewInvitation,
  revokeInvitation as revokeRow,
  toInvitation,
  type InvitationRecord,
} from './invitations-repository'
import { invitationMail } from './invitations-mail'
import {
  duplicateEmail,
  newStudentAccount,
  refuseNonStudent,
  type AcceptResult,
} from './invitation-accounts'
import { acceptLink, previewLink } from './invite-links-service'
import type { InvitationBatchResult, InvitationPreview } from '../../src/contract/studios'
import { joinStudio, ownStudio, studioHasEmail } from '../studios/studios-service'
import type { AcceptInvitationInput } from './invitations-schema'

export const INVITATION_TTL_MS = 7 * 24 * 3600 * 1000
const sha256 = (value: string) => createHash('sha256').update(value).digest('hex')

function newToken() {
  const token = randomBytes(32).toString('base64url')
  return { token, tokenHash: sha256(token), expiresAt: new Date(Date.now() + INVITATION_TTL_MS) }
}

async function mailInvitation(
  ctx: AppContext,
  invitation: InvitationRecord,
  token: string,
  expiresAt: Date,
) {
  const link = `${publicUrl(ctx.config)}/invitations/accept?token=${encodeURIComponent(token)}`
  const invitee = await findUserByEmail(ctx.db, invitation.email)
  const timeZone = await timeZoneOf(ctx.db, invitee?.id ?? invitation.teacherId)
  await ctx.mailer.send(
    invitationMail(invitation.email, { ...invitation, link, expiresAt, timeZone }),
  )
}

async function reload(ctx: AppContext, id: string) {
  const invitation = await findInvitation(ctx.db, id)
  if (!invitation) throw notFound('That invitation')
  return invitation
}

/** Invites an address to a studio; an address already invited gets a fresh link instead. */
export async function invite(
  ctx: AppContext,
  teacherId: string,
  studioId: string,
  email: string,
  message?: string,
) {
  await ownStudio(ctx, teacherId, studioId)
  if (await studioHasEmail(ctx, studioId, email)) {
    throw conflict('This student is already in the studio.', {
      email: ['Already a member of this studio.'],
    })
  }
  // Any address gets the same answer (no hint that it is a teacher's or admin's): a non-student
  // account is refused when the invitation is accepted.
  const open = await findOpenInvitation(ctx.db, studioId, email)
  if (open)
    return { invitation: await resendInvitation(ctx, teacherId, open.id, message), resent: true }
  const { token, tokenHash, expiresAt } = newToken()
  const id = await insertInvitation(ctx.db, {
    studioId,
    email,
    message: message ?? null,
    tokenHash,
    invitedBy: teacherId,
    expiresAt,
  })
  const invitation = await reload(ctx, id)
  await mailInvitation(ctx, invitation, token, expiresAt)
  return { invitation: toInvitation(invitation), resent: false }
}

async function ownInvitation(ctx: AppContext, teacherId: string, id: string) {
  const invitation = await reload(ctx, id)
  if (invitation.teacherId !== teacherId)
    throw forbidden('This invitation belongs to another teacher.')
  return invitation
}

/** A new link and a new week to accept it (a new note replaces the old); the old link stops working. */
export async function resendInvitation(
  ctx: AppContext,
  teacherId: string,
  id: string,
  message?: string,
) {
  const invitation = await ownInvitation(ctx, teacherId, id)
  const { token, tokenHash, expiresAt } = newToken()
  if (!(await renewInvitation(ctx.db, id, tokenHash, expiresAt, message))) {
    throw conflict(`This invitation was already ${invitation.status}; send a new one instead.`)
  }
  const renewed = await reload(ctx, id)
  await mailInvitation(ctx, renewed, token, expiresAt)
  return toInvitation(renewed)
}

/** Invites each address once (in order); members already in the studio are reported, not refused. */
export async function inviteMany(
  ctx: AppContext,
  teacherId: string,
  studioId: string,
  emails: string[],
  message?: string,
): Promise<InvitationBatchResult[]> {
  await ownStudio(ctx, teacherId, studioId)
  const results: InvitationBatchResult[] = []
  for (const email of new Set(emails)) {
    if (await studioHasEmail(ctx, studioId, email)) {
      results.push({ email, outcome: 'member', invitation: null })
      continue
    }
    const { invitation, resent } = await invite(ctx, teacherId, studioId, email, message)
    results.push({ email, outcome: resent ? 'resent' : 'sent', invitation })
  }
  return results
}

export async function revokeInvitation(ctx: AppContext, teacherId: string, id: string) {
  const invitation = await ownInvitation(ctx, teacherId, id)
  if (!(await revokeRow(ctx.db, id)))
    throw conflict(`This invitation was already ${invitation.status}.`)
  return toInvitation(await reload(ctx, id))
}

export const listInvitations = (
  ctx: AppContext,
  teacherId: string,
  q: { studio?: string; status: 'open' | 'all' },
) => listRows(ctx.db, teacherId, { studioId: q.studio, openOnly: q.status === 'open' })

const UNUSABLE: Record<string, string> = {
  revoked: 'This invitation was withdrawn by the teacher.',
  expired: 'This invitation has expired.',
}

/** The invitation behind a token, when it can still be accepted. */
async function usableInvitation(ctx: AppContext, token: string) {
  const invitation = await findInvitationByToken(ctx.db, sha256(token))
  if (!invitation) throw notFound('That invitation')
  // Accepted already: the student has an account and only needs to sign in, not a new link.
  if (invitation.status === 'accepted')
    throw new AppError(
      'invitation_accepted',
      'This invitation was already accepted. Sign in to reach your studio.',
      410,
    )
  const reason = UNUSABLE[invitation.status]
  if (reason)
    throw new AppError('invitation_unusable', `${reason} Ask your teacher to send a new one.`, 410)
  return invitation
}

export async function previewInvitation(
  ctx: AppContext,
  token: string,
): Promise<InvitationPreview> {
  const viaLink = await previewLink(ctx, sha256(token))
  if (viaLink) return viaLink
  const invitation = await usableInvitation(ctx, token)
  const { studioName, teacherName, email, expiresAt } = invitation
  return {
    studioName,
    teacherName,
    email,
    expiresAt,
    accountExists: Boolean(await findUserByEmail(ctx.db, email)),
  }
}

/** Only the invited address may accept, and only as a student (a link forwarded is worth nothing). */
function refuseOtherAccount(invitation: InvitationRecord, current: PublicUser) {
  refuseNonStudent(current)
  if (current.email.toLowerCase() !== invitation.email.toLowerCase()) {
    throw new AppError(
      'invitation_for_other_address',
      `This invitation was sent to ${invitation.email}. Sign out and accept it with that address, or ask your teacher to invite ${current.email}.`,
      403,
    )
  }
}

/**
 * Accepts an invitation: the signed-in student joins, or a new student account (with the invited
 * e-mail) is created and joins. Returns the new account when one was created, so the route signs it in.
 */
export async function acceptInvitation(
  ctx: AppContext,
  input: AcceptInvitationInput,
  current: PublicUser | null,
): Promise<AcceptResult> {
  const viaLink = await acceptLink(ctx, sha256(input.token), input, current)
  if (viaLink) return viaLink
  const invitation = await usableInvitation(ctx, input.token)
  if (current) refuseOtherAccount(invitation, current)
  const account = current ? null : await newStudentAccount(ctx, invitation.email, input)
  return ctx.db.transaction(async (trx) => {
    const created: UserRecord | null = account
      ? await insertUser(trx, account).catch(duplicateEmail)
      : null
    const studentId = current?.id ?? created!.id
    if (!(await consumeInvitation(trx, invitation.id, studentId))) {
      throw new AppError(
        'invitation_unusable',
        'This invitation was used or withdrawn a moment ago.',
        410,
      )
    }
    const { joined, sharesFrom } = await joinStudio(
      trx,
      invitation.studioId,
      studentId,
      input.shareHistory,
    )
    return {
      created,
      studioId: invitation.studioId,
      studioName: invitation.studioName,
      alreadyMember: !joined,
      sharesFrom: joined ? sharesFrom : null,
    }
  })
}
