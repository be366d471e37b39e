// Texts of the plan e-mails: a plan was assigned, a plan is due soon.
import { publicUrl, type Config } from '../config'
import type { OutgoingMail } from '../lib/mail'
import { describePreset } from '../../src/contract/drills'
import { describeTarget } from '../../src/contract/targets'
import type { PlanItem } from '../../src/contract/plans'
import { mailDateTime } from '../../src/contract/local-time'

/** A recipient of a plan e-mail, with the IANA time zone its dates are written in. */
export interface PlanMailRecipient {
  email: string
  name: string
  timeZone: string
}

/** The due date in the recipient's time zone, named, so nobody converts from UTC. */
const dateText = (due: Date | string | null, timeZone: string) =>
  due ? mailDateTime(new Date(due), timeZone) : 'no due date'

const itemLines = (items: Pick<PlanItem, 'preset' | 'target'>[]) =>
  items.map(
    (item, i) =>
      `${i + 1}. ${describePreset(item.preset)}\n   Target: ${describeTarget(item.target)}`,
  )

export function planAssignedMail(
  config: Config,
  to: PlanMailRecipient,
  plan: { title: string; notes: string; dueAt: string | null; items: PlanItem[] },
  teacherName: string,
): OutgoingMail {
  return {
    to: to.email,
    subject: `New practice plan: ${plan.title}`,
    text: [
      `Hello ${to.name},`,
      '',
      `${teacherName} assigned you the practice plan "${plan.title}" (due ${dateText(plan.dueAt, to.timeZone)}).`,
      ...(plan.notes ? ['', plan.notes] : []),
      '',
      ...itemLines(plan.items),
      '',
      `Start it from your plans: ${publicUrl(config)}/plans`,
      '',
      'Short, regular sessions work best. Take a break when your hands tire, and stop if anything hurts.',
    ].join('\n'),
  }
}

export function dueSoonMail(
  config: Config,
  to: PlanMailRecipient,
  plan: { title: string; dueAt: Date; targetsMet: number; targetsTotal: number },
): OutgoingMail {
  return {
    to: to.email,
    subject: `Due soon: ${plan.title}`,
    text: [
      `Hello ${to.name},`,
      '',
      `Your practice plan "${plan.title}" is due ${dateText(plan.dueAt, to.timeZone)}.`,
      `You have reached ${plan.targetsMet} of ${plan.targetsTotal} targets so far.`,
      '',
      `Pick it up here: ${publicUrl(config)}/plans`,
    ].join('\n'),
  }
}

export function dueDateChangedMail(
  config: Config,
  to: PlanMailRecipient,
  plan: { title: string; dueAt: string | null },
  teacherName: string,
): OutgoingMail {
  return {
    to: to.email,
    subject: `New due date: ${plan.title}`,
    text: [
      `Hello ${to.name},`,
      '',
      plan.dueAt
        ? `${teacherName} moved the due date of "${plan.title}" to ${dateText(plan.dueAt, to.timeZone)}.`
        : `${teacherName} removed the due date of "${plan.title}": take it at your own pace.`,
      '',
      `Your plans: ${publicUrl(config)}/plans`,
    ].join('\n'),
  }
}
