// Text of the "comment received" e-mail.
import { publicUrl, type Config } from '../config'
import type { OutgoingMail } from '../lib/mail'

const EXCERPT = 600

export function commentMail(
  config: Config,
  to: { email: string; name: string },
  comment: { authorName: string; planTitle: string; body: string; path: string },
): OutgoingMail {
  const excerpt =
    comment.body.length > EXCERPT ? `${comment.body.slice(0, EXCERPT)}…` : comment.body
  return {
    to: to.email,
    subject: `${comment.authorName} commented on "${comment.planTitle}"`,
    text: [
      `Hello ${to.name},`,
      '',
      `${comment.authorName} wrote about the practice plan "${comment.planTitle}":`,
      '',
      ...excerpt.split('\n').map((line) => `> ${line}`),
      '',
      `Read and reply: ${publicUrl(config)}${comment.path}`,
    ].join('\n'),
  }
}
