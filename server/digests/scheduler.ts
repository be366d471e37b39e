// A small scheduler in every app process: each tick creates the coming months' answer partitions,
// sends due-soon reminders and, once per week, the teachers' digests. One process at a time runs a
// job (advisory lock); what was sent is in notification_log, so no restart or process resends.
import { ensureMonthPartitions } from '../attempts/attempts-repository'
import type { AppContext } from '../context'
import { runAlone } from '../lib/job-lock'
import { digestDue, sendDueSoonReminders, sendWeeklyDigests } from './digest-service'
import { sendInvoiceReminders } from '../billing/reminders-service'

/** The lock and scheduled_runs name of the mail job. */
export const MAIL_JOB = 'scheduled-mail'
export const PARTITIONS_JOB = 'attempt-partitions'

export async function runScheduledJobs(ctx: AppContext, now = new Date()) {
  const reminders = await sendDueSoonReminders(ctx, now)
  const digests = digestDue(now) ? await sendWeeklyDigests(ctx, now) : { sent: 0 }
  const invoices = await sendInvoiceReminders(ctx, now)
  return { reminders: reminders.sent, digests: digests.sent, invoiceReminders: invoices.sent }
}

/** One tick: each job unless another process runs it right now; the mail job's result or null. */
export async function scheduledTick(ctx: AppContext, now = new Date()) {
  await runAlone(ctx.db, PARTITIONS_JOB, () => ensureMonthPartitions(ctx.db))
  const run = await runAlone(ctx.db, MAIL_JOB, () => runScheduledJobs(ctx, now))
  return run.ran ? run.result : null
}

export function startScheduler(ctx: AppContext) {
  let running = false
  const tick = async () => {
    if (running) return
    running = true
    try {
      const result = await scheduledTick(ctx)
      if (result?.reminders || result?.digests || result?.invoiceReminders)
        ctx.logger.info(result, 'scheduled mail sent')
    } catch (err) {
      ctx.logger.error({ err }, 'scheduled mail failed')
    } finally {
      running = false
    }
  }
  const { schedulerFirstRunMs, schedulerIntervalMs } = ctx.config
  const first = setTimeout(tick, schedulerFirstRunMs).unref()
  const timer = setInterval(tick, schedulerIntervalMs).unref()
  return {
    stop() {
      clearTimeout(first)
      clearInterval(timer)
    },
  }
}
