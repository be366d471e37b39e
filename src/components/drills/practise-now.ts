// What "Practise now" offers, most useful first: the next unmet item of the plan due soonest; else
// the weakest place the statistics know (Neck Recall, with the statistics choosing its first
// questions); else the drill last played here; else a round to keep practised places fresh; else, for someone
// who has never practised, a short first session. "Continue where you left off" (the drill last
// played in this browser) is offered beside it, and alone when nothing else is known.
import type { Assignment } from '@/api/plans'
import type { DrillId } from '@/contract/drills'
import { weakestOf, type PlaceFigures } from '@/contract/weak-places'

export type PracticeChoice =
  | { kind: 'plan'; drill: DrillId; itemId: string; planTitle: string }
  | { kind: 'weakest'; drill: 'recall'; place: PlaceFigures }
  | { kind: 'continue'; drill: DrillId }
  | { kind: 'review'; drill: 'recall' }
  | { kind: 'first'; drill: 'hunt' }

export interface PracticeFacts {
  /** The student's assigned plans (none for a teacher or when they failed to load). */
  assigned: readonly Assignment[]
  /** Every practised place of the active instrument, all drills (none when it failed to load). */
  places: readonly PlaceFigures[]
  /** The drill last played in this browser, if any. */
  last: DrillId | null
}

/** Overdue plans first, then by due date (none last); ties keep the server's order. */
function dueOrder(a: Assignment, b: Assignment) {
  if (a.overdue !== b.overdue) return a.overdue ? -1 : 1
  const due = (x: Assignment) => (x.dueAt ? Date.parse(x.dueAt) : Infinity)
  return due(a) - due(b)
}

/** The first item whose target is not met, of the unfinished plan due soonest. */
export function nextPlanItem(assigned: readonly Assignment[]) {
  for (const plan of assigned.filter((a) => !a.complete).sort(dueOrder)) {
    const item = plan.items.find((i) => !i.progress.met)
    if (item) return { plan, item }
  }
  return null
}

export function choosePractice({ assigned, places, last }: PracticeFacts): PracticeChoice {
  const next = nextPlanItem(assigned)
  if (next)
    return {
      kind: 'plan',
      drill: next.item.preset.drill,
      itemId: next.item.id,
      planTitle: next.plan.title,
    }
  // the rule of the progress page's "places to practise most" and the teacher's roster
  const [place] = weakestOf([...places], 1)
  if (place) return { kind: 'weakest', drill: 'recall', place }
  if (last) return { kind: 'continue', drill: last }
  if (places.length) return { kind: 'review', drill: 'recall' }
  return { kind: 'first', drill: 'hunt' }
}

/** Whether the facts show practice before (the greeting says "Welcome back"). */
export const hasPractised = (facts: PracticeFacts) => facts.last !== null || facts.places.length > 0
