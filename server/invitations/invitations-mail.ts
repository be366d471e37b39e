// Text of the invitation e-mail.
import type { OutgoingMail } from '../lib/mail'
import { mailDateTime } from '../../src/contract/local-time'

export function invitationMail(
  email: string,
  invite: {
    teacherName: string
    studioName: string
    link: string
    expiresAt: Date
    /** The invitee's zone when they have an account, else the teacher's. */
    timeZone: string
    /** The teacher's personal note. */
    message: string | null
  },
): OutgoingMail {
  return {
    to: email,
    subject: `${invite.teacherName} invites you to ${invite.studioName} on Ambitus`,
    text: [
      'Hello,',
      '',
      `${invite.teacherName} invites you to join "${invite.studioName}" on Ambitus, where your teacher`,
      'assigns fretboard practice and follows how it goes between lessons.',
      '',
      ...(invite.message
        ? [`${invite.teacherName} writes:`, ...invite.message.split('\n').map((l) => `> ${l}`), '']
        : []),
      'Open this link to accept (you can create an account or sign in to an existing one):',
      invite.link,
      '',
      `The link works once and expires on ${mailDateTime(invite.expiresAt, invite.timeZone)}.`,
      'If you were not expecting this, ignore the message; nothing happens unless you accept.',
    ].join('\n'),
  }
}
