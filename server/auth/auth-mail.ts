// Texts of the sign-in e-mails.
import type { OutgoingMail } from '../lib/mail'
import type { PublicUser } from '../users/users-schema'

export function resetMail(user: PublicUser, link: string): OutgoingMail {
  return {
    to: user.email,
    subject: 'Reset your Ambitus password',
    text: [
      `Hello ${user.name},`,
      '',
      'Someone (hopefully you) asked to reset the password of your Ambitus account.',
      `Open this link within one hour to choose a new password:`,
      link,
      '',
      'If you did not ask for this, ignore this message; your password stays as it is.',
    ].join('\n'),
  }
}
