// Assigned plans with live progress: every item's target evaluated against the student's attempts.
import type { AppContext } from '../context'
import { assertCanReadStudent } from '../access/student-access'
import type { PublicUser } from '../users/users-schema'
import {
  assignmentActivity,
  assignmentRows,
  itemReferences,
  type AssignmentRow,
} from '../assignments/assignments-service'
import { itemAttempts } from './item-attempts-repository'
import { itemsOfPlans } from './plans-repository'
import type { Assignment } from '../../src/contract/assignments'
import type { PlanItem } from '../../src/contract/plans'
import { evaluateTarget, type ItemAttempt } from './target-progress'

interface Loaded {
  items: Map<string, PlanItem[]>
  attempts: Map<string, ItemAttempt[]>
  comments: Map<string, number>
  recordings: Awaited<ReturnType<typeof assignmentActivity>>['recordings']
  references: Awaited<ReturnType<typeof itemReferences>>
}

function toAssignment(row: AssignmentRow, loaded: Loaded, now: Date): Assignment {
  const items = (loaded.items.get(row.planId) ?? []).map((item) => ({
    ...item,
    progress: evaluateTarget(
      item.target,
      item.preset,
      loaded.attempts.get(`${row.studentId}:${item.id}`) ?? [],
    ),
    recordings: loaded.recordings
      .filter((r) => r.assignmentId === row.id && r.summary.planItemId === item.id)
      .map((r) => r.summary),
    references: loaded.references.filter((r) => r.planItemId === item.id),
  }))
  const targetsMet = items.filter((item) => item.progress.met).length
  const complete = items.length > 0 && targetsMet === items.length
  return {
    id: row.id,
    planId: row.planId,
    title: row.title,
    notes: row.notes,
    dueAt: row.dueAt ? row.dueAt.toISOString() : null,
    assignedAt: row.assignedAt.toISOString(),
    teacher: { id: row.teacherId, name: row.teacherName },
    student: { id: row.studentId, name: row.studentName },
    items,
    targetsMet,
    complete,
    overdue: !complete && row.dueAt !== null && row.dueAt.getTime() < now.getTime(),
    commentCount: loaded.comments.get(row.id) ?? 0,
  }
}

/** Adds items, progress, recordings and comment counts to assignment rows. */
export async function buildAssignments(
  ctx: AppContext,
  rows: AssignmentRow[],
  now = new Date(),
): Promise<Assignment[]> {
  const planIds = [...new Set(rows.map((r) => r.planId))]
  const studentIds = [...new Set(rows.map((r) => r.studentId))]
  const items = await itemsOfPlans(ctx.db, planIds)
  const itemIds = [...items.values()].flat().map((item) => item.id)
  const assignmentIds = rows.map((r) => r.id)
  const [attempts, { comments, recordings }, references] = await Promise.all([
    itemAttempts(ctx.db, studentIds, itemIds),
    assignmentActivity(ctx, assignmentIds),
    itemReferences(ctx, itemIds),
  ])
  const loaded = { items, attempts, comments, recordings, references }
  return rows.map((row) => toAssignment(row, loaded, now))
}

/** The signed-in student's assigned plans. */
export async function assignmentsOfStudent(
  ctx: AppContext,
  studentId: string,
): Promise<Assignment[]> {
  return buildAssignments(ctx, await assignmentRows(ctx, { studentId }))
}

/** One student's plans from this teacher (the student must be in one of the teacher's studios). */
export async function studentAssignmentsForTeacher(
  ctx: AppContext,
  teacher: PublicUser,
  studentId: string,
) {
  await assertCanReadStudent(ctx, teacher, studentId)
  return buildAssignments(ctx, await assignmentRows(ctx, { studentId, teacherId: teacher.id }))
}
