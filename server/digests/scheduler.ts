// A small in-process scheduler: every few minutes it sends due-soon reminders and, once per week,
// the teachers' digests. What was sent is in notification_log, so restarts never resend.
import type { AppContext } from '../context'
import { digestDue, sendDueSoonReminders, sendWeeklyDigests } from './digest-service'
import { sendInvoiceReminders } from '../billing/reminders-service'

const DEFAULT_INTERVAL_MS = 10 * 60 * 1000
const FIRST_RUN_MS = 60 * 1000

export async function runScheduledJobs(ctx: AppContext, now = new Date()) {
  const reminders = await sendDueSoonReminders(ctx, now)
  const digests = digestDue(now) ? await sendWeeklyDigests(ctx, now) : { sent: 0 }
  const invoices = await sendInvoiceReminders(ctx, now)
  return { reminders: reminders.sent, digests: digests.sent, invoiceReminders: invoices.sent }
}

export function startScheduler(ctx: AppContext, intervalMs = DEFAULT_INTERVAL_MS) {
  let running = false
  const tick = async () => {
    if (running) return
    running = true
    try {
      const result = await runScheduledJobs(ctx)
      if (result.reminders || result.digests || result.invoiceReminders)
        ctx.logger.info(result, 'scheduled mail sent')
    } catch (err) {
      ctx.logger.error({ err }, 'scheduled mail failed')
    } finally {
      running = false
    }
  }
  const first = setTimeout(tick, FIRST_RUN_MS).unref()
  const timer = setInterval(tick, intervalMs).unref()
  return {
    stop() {
      clearTimeout(first)
      clearInterval(timer)
    },
  }
}
