// Best-effort notification mail: a failed send is logged and never undoes what the user just did.
import type { AppContext } from '../context'
import type { OutgoingMail } from '../lib/mail'

export async function notify(ctx: AppContext, mails: OutgoingMail[]): Promise<void> {
  await Promise.all(
    mails.map((mail) =>
      ctx.mailer
        .send(mail)
        .catch((err: unknown) =>
          ctx.logger.warn({ err, subject: mail.subject }, 'notification mail failed'),
        ),
    ),
  )
}
