// Weekly digests for teachers and due-soon reminders for students, each recorded in
// notification_log before sending so nothing goes out twice.
import type { AppContext } from '../context'
import { assignmentRows } from '../assignments/assignments-service'
import { buildAssignments } from '../plans/assigned-plans'
import { dueSoonMail } from '../plans/plans-mail'
import { rosterRows } from '../roster/roster-service'
import { findUserById, timeZoneOf } from '../users/users-repository'
import type { OutgoingMail } from '../lib/mail'
import { digestMail } from './digest-mail'
import {
  claimNotification,
  releaseNotification,
} from '../notifications/notification-log-repository'
import { studioTeachers } from './digest-repository'

const HOUR_MS = 3600 * 1000
export const DUE_SOON_HOURS = 24

/** ISO 8601 week of a date, e.g. "2026-W49" (weeks start on Monday; week 1 holds the first Thursday). */
export function isoWeek(date: Date): string {
  const d = new Date(Date.UTC(date.getUTCFullYear(), date.getUTCMonth(), date.getUTCDate()))
  const day = d.getUTCDay() || 7
  d.setUTCDate(d.getUTCDate() + 4 - day)
  const yearStart = Date.UTC(d.getUTCFullYear(), 0, 1)
  const week = Math.ceil(((d.getTime() - yearStart) / (24 * HOUR_MS) + 1) / 7)
  return `${d.getUTCFullYear()}-W${String(week).padStart(2, '0')}`
}

/** The weekly digest goes out on the first run from Monday 07:00 UTC on. */
export const digestDue = (now: Date) => !(now.getUTCDay() === 1 && now.getUTCHours() < 7)

/** Sends a mail under a claim; a failed send gives the claim back. */
async function sendOnce(
  ctx: AppContext,
  kind: string,
  key: string,
  mail: OutgoingMail,
): Promise<boolean> {
  if (!(await claimNotification(ctx.db, kind, key, mail.to))) return false
  try {
    await ctx.mailer.send(mail)
    return true
  } catch (error) {
    await releaseNotification(ctx.db, kind, key)
    throw error
  }
}

/** One digest per teacher with students; `force` (the admin action) sends again this week. */
export async function sendWeeklyDigests(
  ctx: AppContext,
  now: Date,
  options: { force?: boolean } = {},
) {
  const week = isoWeek(now)
  let sent = 0
  for (const teacher of await studioTeachers(ctx.db)) {
    const rows = await rosterRows(ctx, teacher.id, now)
    if (!rows.length) continue
    const mail = digestMail(ctx.config, teacher, rows, week, options.force)
    const key = options.force
      ? `${teacher.id}:${week}:now:${now.toISOString()}`
      : `${teacher.id}:${week}`
    if (await sendOnce(ctx, options.force ? 'weekly-digest-now' : 'weekly-digest', key, mail))
      sent += 1
  }
  return { sent }
}

/** Reminds students of unfinished plans due within the next 24 hours, once per due date. */
export async function sendDueSoonReminders(ctx: AppContext, now: Date) {
  const rows = await assignmentRows(ctx, {
    dueBetween: [now, new Date(now.getTime() + DUE_SOON_HOURS * HOUR_MS)],
  })
  let sent = 0
  for (const assignment of await buildAssignments(ctx, rows, now)) {
    if (assignment.complete || !assignment.dueAt) continue
    const student = await findUserById(ctx.db, assignment.student.id)
    if (!student) continue
    const plan = {
      title: assignment.title,
      dueAt: new Date(assignment.dueAt),
      targetsMet: assignment.targetsMet,
      targetsTotal: assignment.items.length,
    }
    if (
      await sendOnce(
        ctx,
        'due-soon',
        `${assignment.id}:${assignment.dueAt}`,
        dueSoonMail(
          ctx.config,
          { ...student, timeZone: await timeZoneOf(ctx.db, student.id) },
          plan,
        ),
      )
    )
      sent += 1
  }
  return { sent }
}
