// Text of the e-mail copy of a teacher's message.
import { publicUrl, type Config } from '../config'
import type { OutgoingMail } from '../lib/mail'

export function messageMail(
  config: Config,
  to: { email: string; name: string },
  message: { teacherName: string; subject: string; body: string },
): OutgoingMail {
  return {
    to: to.email,
    subject: `${message.teacherName}: ${message.subject}`,
    text: [
      `Hello ${to.name},`,
      '',
      `${message.teacherName} wrote to you:`,
      '',
      ...message.body.split('\n').map((line) => `> ${line}`),
      '',
      `Read it in the app: ${publicUrl(config)}/messages`,
    ].join('\n'),
  }
}
