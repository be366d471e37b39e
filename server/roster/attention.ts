// Who needs the teacher's attention, and why in words: plans overdue or behind, no practice (since
// the last lesson when there was one, else for a week), accuracy falling, recall slowing. Pure, so
// the rules are unit-tested; the roster sorts by the weight of the reasons.
import { calendarDaysBetween } from '../../src/contract/local-time'
import type { Assignment } from '../../src/contract/assignments'
import type { AttentionKind, AttentionReason, RecallTrend } from '../../src/contract/roster'

export interface AttentionFacts {
  lastPracticeAt: Date | null
  /** Right answers / answers over the last 7 days and the 7 before, with their answer counts. */
  week: { accuracy: number | null; answers: number }
  previousWeek: { accuracy: number | null; answers: number }
  recall: RecallTrend
  assignments: Assignment[]
  /** The last lesson that took place, when lessons are kept. */
  lastLessonAt?: Date | null
  /** The viewer's zone, for the days in the words. */
  timeZone: string
  /** The student shares practice from this instant on (joined a second studio); null: all. */
  sharesFrom?: Date | null
}

const WEIGHT: Record<AttentionKind, number> = {
  overdue: 5,
  'behind-targets': 4,
  'no-practice': 3,
  'accuracy-falling': 2,
  'recall-slowing': 1,
}
/** A week's accuracy counts as falling from this drop on (10 points), with this many answers a week. */
export const ACCURACY_DROP = 0.1
export const MIN_WEEK_ANSWERS = 20
/** Recall counts as slowing from this much slower on (the trend arrow starts at 5 %). */
export const RECALL_SLOWDOWN = 0.1
export const QUIET_DAYS = 7
const DUE_SOON_MS = 2 * 24 * 3600 * 1000

const pct = (x: number) => `${Math.round(x * 100)} %`
const reason = (kind: AttentionKind, text: string): AttentionReason => ({ kind, text })

function planReasons(assignments: Assignment[], now: Date): AttentionReason[] {
  return assignments.flatMap((a) => {
    if (a.complete || !a.dueAt) return []
    const due = Date.parse(a.dueAt)
    const met = `${a.targetsMet} of ${a.items.length} targets met`
    if (due < now.getTime()) return [reason('overdue', `"${a.title}" is overdue (${met})`)]
    if (due < now.getTime() + DUE_SOON_MS && a.targetsMet < a.items.length / 2)
      return [reason('behind-targets', `Behind on "${a.title}", due soon: ${met}`)]
    return []
  })
}

function practiceReason(f: AttentionFacts, now: Date): AttentionReason[] {
  if (f.lastLessonAt && (!f.lastPracticeAt || f.lastPracticeAt < f.lastLessonAt)) {
    const day = new Intl.DateTimeFormat('en-GB', {
      timeZone: f.timeZone,
      weekday: 'short',
      day: 'numeric',
      month: 'short',
    }).format(f.lastLessonAt)
    return [reason('no-practice', `No practice since the lesson on ${day}`)]
  }
  if (!f.lastPracticeAt)
    return [reason('no-practice', f.sharesFrom ? 'No practice since joining' : 'No practice yet')]
  const days = calendarDaysBetween(f.lastPracticeAt, now, f.timeZone)
  return days >= QUIET_DAYS ? [reason('no-practice', `No practice for ${days} days`)] : []
}

function trendReasons(f: AttentionFacts): AttentionReason[] {
  const out: AttentionReason[] = []
  const [now, before] = [f.week, f.previousWeek]
  if (
    now.accuracy !== null &&
    before.accuracy !== null &&
    now.answers >= MIN_WEEK_ANSWERS &&
    before.answers >= MIN_WEEK_ANSWERS &&
    before.accuracy - now.accuracy >= ACCURACY_DROP
  )
    out.push(
      reason(
        'accuracy-falling',
        `Accuracy down from ${pct(before.accuracy)} to ${pct(now.accuracy)}`,
      ),
    )
  if (f.recall.change !== null && f.recall.change >= RECALL_SLOWDOWN)
    out.push(reason('recall-slowing', `Recall ${pct(f.recall.change)} slower than the week before`))
  return out
}

/** The reasons, most pressing first (see WEIGHT); empty when nothing needs a look. */
export function attentionReasons(facts: AttentionFacts, now: Date): AttentionReason[] {
  return [
    ...planReasons(facts.assignments, now),
    ...practiceReason(facts, now),
    ...trendReasons(facts),
  ].sort((a, b) => WEIGHT[b.kind] - WEIGHT[a.kind])
}

/** How much a row needs attention, for sorting: the weights of its reasons added up. */
export const attentionScore = (reasons: AttentionReason[]) =>
  reasons.reduce((sum, r) => sum + WEIGHT[r.kind], 0)
