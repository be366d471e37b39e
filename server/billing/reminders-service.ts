// Payment reminders by e-mail: once three days before an open invoice is due and once after it is
// overdue. Each is claimed in invoice_reminders before it is sent (never twice, also across
// restarts), and one run sends at most MAX_PER_RUN, so a backlog trickles out instead of flooding.
import type { AppContext } from '../context'
import { sendReminderMail } from './invoice-mail'
import { claimReminder, remindersDue } from './payments-repository'
import type { CurrencyCode } from '../../src/contract/money'

const MAX_PER_RUN = 50
const KINDS = ['before_due', 'overdue'] as const

export async function sendInvoiceReminders(ctx: AppContext, now = new Date()) {
  const today = now.toISOString().slice(0, 10)
  let sent = 0
  for (const kind of KINDS) {
    for (const due of await remindersDue(ctx.db, kind, today, MAX_PER_RUN - sent)) {
      if (!(await claimReminder(ctx.db, due.id, kind))) continue
      const facts = {
        number: due.number,
        totalMinor: due.total_minor,
        currency: due.currency.trim() as CurrencyCode,
        dueOn: due.due_on,
        studentName: due.student_name,
        studioName: due.studio_name,
      }
      await sendReminderMail(ctx.config, ctx.mailer, due.email, facts, kind)
      sent += 1
    }
    if (sent >= MAX_PER_RUN) break
  }
  return { sent }
}
