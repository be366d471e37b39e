// Text of the mail a student gets when their teacher's account stops being a teacher's.
import { publicUrl, type Config } from '../config'
import type { OutgoingMail } from '../lib/mail'

export function studioPausedMail(
  config: Config,
  to: { email: string; name: string; studioName: string },
  teacherName: string,
): OutgoingMail {
  return {
    to: to.email,
    subject: `"${to.studioName}" is paused`,
    text: [
      `Hello ${to.name},`,
      '',
      `${teacherName} no longer teaches on Ambitus, so the studio "${to.studioName}" is paused.`,
      'Your practice plans, comments and recordings stay with you, and you can keep practising.',
      `${teacherName} can no longer see your progress or your recordings.`,
      'If they teach here again, the studio opens again as it was.',
      '',
      `Your plans: ${publicUrl(config)}/plans`,
    ].join('\n'),
  }
}
