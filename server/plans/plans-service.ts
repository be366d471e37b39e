// Practice plan use cases for teachers: create, edit, copy, delete, assign and unassign; and the
// plan item a drill view opens (for the assigned student and the plan's teacher).
import type { AppContext } from '../context'
import { forbidden, notFound } from '../lib/errors'
import type { PublicUser } from '../users/users-schema'
import { teacherStudents } from '../access/access-repository'
import {
  assignmentOf,
  assignmentRows,
  assignStudents,
  dropRecordingFiles,
  purgeAssignments,
  recordingKeys,
} from '../assignments/assignments-service'
import { notify } from '../notifications/notify'
import {
  deletePlan as removePlan,
  findItemWithPlan,
  findPlan,
  findPlanRecord,
  insertPlan,
  listTeacherPlans,
  updatePlan as replacePlan,
  type PlanRecord,
} from './plans-repository'
import { dueDateChangedMail, planAssignedMail } from './plans-mail'
import { timeZonesOf } from '../users/users-repository'
import { buildAssignments } from './assigned-plans'
import type { Assignment } from '../../src/contract/assignments'
import type {
  AssigneeProgress,
  Plan,
  PlanCreateInput,
  PlanItemContext,
  PlanUpdateInput,
} from '../../src/contract/plans'
import { STARTER_PLANS } from '../../src/contract/starter-plans'

/** How far the student of an assignment is through its plan. */
function progressOf(assignment: Assignment): AssigneeProgress {
  const ratios = assignment.items.map((item) => item.progress.ratio)
  return {
    targetsMet: assignment.targetsMet,
    targetsTotal: assignment.items.length,
    share: ratios.length ? ratios.reduce((a, b) => a + b, 0) / ratios.length : 0,
    complete: assignment.complete,
    overdue: assignment.overdue,
  }
}

/** The teacher's plans, each assignee with how far they are. */
export async function listPlans(ctx: AppContext, teacherId: string): Promise<Plan[]> {
  const [list, assignments] = await Promise.all([
    listTeacherPlans(ctx.db, teacherId),
    assignmentRows(ctx, { teacherId }).then((rows) => buildAssignments(ctx, rows)),
  ])
  const byId = new Map(assignments.map((a) => [a.id, a]))
  return list.map((plan) => ({
    ...plan,
    assignees: plan.assignees.map((a) => {
      const assignment = byId.get(a.assignmentId)
      return assignment ? { ...a, progress: progressOf(assignment) } : a
    }),
  }))
}
export const starterPlans = () => STARTER_PLANS

async function ownPlan(ctx: AppContext, teacherId: string, planId: string): Promise<PlanRecord> {
  const plan = await findPlanRecord(ctx.db, planId)
  if (!plan) throw notFound('That plan')
  if (plan.teacherId !== teacherId) throw forbidden('This plan belongs to another teacher.')
  return plan
}

async function loadPlan(ctx: AppContext, planId: string): Promise<Plan> {
  const plan = await findPlan(ctx.db, planId)
  if (!plan) throw notFound('That plan')
  return plan
}

/** The teacher's students by id; 403 when any of the ids is not one of them. */
async function assignableStudents(ctx: AppContext, teacherId: string, studentIds: string[]) {
  const students = await teacherStudents(ctx.db, teacherId)
  const byId = new Map(students.map((s) => [s.id, s]))
  if (studentIds.some((id) => !byId.has(id))) {
    throw forbidden('Plans can only be assigned to students of your studios.')
  }
  return byId
}

type Students = Awaited<ReturnType<typeof assignableStudents>>

/** Mails the students newly assigned and returns the plan as it now is. */
async function announce(
  ctx: AppContext,
  teacher: PublicUser,
  planId: string,
  added: { ids: string[]; students: Students },
) {
  const plan = await loadPlan(ctx, planId)
  const zones = await timeZonesOf(ctx.db, added.ids)
  const recipient = (id: string) => ({
    ...added.students.get(id)!,
    timeZone: zones.get(id) ?? 'UTC',
  })
  await notify(
    ctx,
    added.ids.map((id) => planAssignedMail(ctx.config, recipient(id), plan, teacher.name)),
  )
  return plan
}

/** Assigns the plan to students of the teacher's studios and mails the ones newly assigned. */
async function assign(ctx: AppContext, teacher: PublicUser, planId: string, studentIds: string[]) {
  const students = await assignableStudents(ctx, teacher.id, studentIds)
  const ids = await assignStudents(ctx, planId, [...new Set(studentIds)])
  return announce(ctx, teacher, planId, { ids, students })
}

export async function getPlan(ctx: AppContext, teacherId: string, planId: string) {
  await ownPlan(ctx, teacherId, planId)
  return loadPlan(ctx, planId)
}

export async function createPlan(ctx: AppContext, teacher: PublicUser, input: PlanCreateInput) {
  const { studentIds, ...fields } = input
  // Checked before anything is written; the plan and its assignments are then one transaction.
  const students = await assignableStudents(ctx, teacher.id, studentIds)
  const { planId, ids } = await ctx.db.transaction(async (trx) => {
    const planId = await insertPlan(trx, teacher.id, fields)
    return { planId, ids: await assignStudents(ctx, planId, [...new Set(studentIds)], trx) }
  })
  return announce(ctx, teacher, planId, { ids, students })
}

export async function updatePlan(
  ctx: AppContext,
  teacher: PublicUser,
  planId: string,
  input: PlanUpdateInput,
) {
  const current = await getPlan(ctx, teacher.id, planId)
  const sent = new Set(input.items.map((item) => item.id))
  const removed = current.items.filter((item) => !sent.has(item.id)).map((item) => item.id)
  const keys = await recordingKeys(ctx, { itemIds: removed })
  await ctx.db.transaction((trx) => replacePlan(trx, planId, input))
  await dropRecordingFiles(ctx, keys)
  const plan = await loadPlan(ctx, planId)
  if (sameInstant(current.dueAt, plan.dueAt)) return plan
  await announceDueDate(ctx, teacher, plan)
  return plan
}

const sameInstant = (a: string | null, b: string | null) =>
  a === b || (a !== null && b !== null && Date.parse(a) === Date.parse(b))

/** Tells the plan's students that its due date moved (or went), each in their own time zone. */
async function announceDueDate(ctx: AppContext, teacher: PublicUser, plan: Plan) {
  const ids = plan.assignees.map((a) => a.studentId)
  const [students, zones] = await Promise.all([
    teacherStudents(ctx.db, teacher.id),
    timeZonesOf(ctx.db, ids),
  ])
  const mails = students
    .filter((s) => zones.has(s.id))
    .map((s) =>
      dueDateChangedMail(ctx.config, { ...s, timeZone: zones.get(s.id)! }, plan, teacher.name),
    )
  await notify(ctx, mails)
}

/** A copy with the same notes, items and due date, assigned to nobody. */
export async function copyPlan(ctx: AppContext, teacherId: string, planId: string) {
  const plan = await getPlan(ctx, teacherId, planId)
  const copy = {
    title: `${plan.title} (copy)`.slice(0, 120),
    notes: plan.notes,
    dueAt: plan.dueAt,
    items: plan.items.map(({ preset, target }) => ({ preset, target })),
  }
  const newId = await ctx.db.transaction((trx) => insertPlan(trx, teacherId, copy))
  return loadPlan(ctx, newId)
}

export async function deletePlan(ctx: AppContext, teacherId: string, planId: string) {
  await ownPlan(ctx, teacherId, planId)
  const keys = await recordingKeys(ctx, { planId })
  await removePlan(ctx.db, planId)
  await dropRecordingFiles(ctx, keys)
}

export async function assignPlan(
  ctx: AppContext,
  teacher: PublicUser,
  planId: string,
  studentIds: string[],
) {
  await ownPlan(ctx, teacher.id, planId)
  return assign(ctx, teacher, planId, studentIds)
}

/** Removes one student's assignment, with its comments and recordings. */
export async function unassignPlan(
  ctx: AppContext,
  teacherId: string,
  planId: string,
  studentId: string,
) {
  await ownPlan(ctx, teacherId, planId)
  const assignmentId = await assignmentOf(ctx, planId, studentId)
  if (!assignmentId) throw notFound('That assignment')
  await purgeAssignments(ctx, [assignmentId])
  return loadPlan(ctx, planId)
}

/** A plan item for a drill view: its student (when assigned) or its teacher may open it. */
export async function planItemContext(
  ctx: AppContext,
  user: PublicUser,
  itemId: string,
): Promise<PlanItemContext> {
  const found = await findItemWithPlan(ctx.db, itemId)
  if (!found) throw notFound('That plan item')
  const isTeacher = found.teacherId === user.id && user.role === 'teacher'
  const isStudent = !isTeacher && (await assignmentOf(ctx, found.planId, user.id)) !== null
  if (!isTeacher && !isStudent) throw forbidden('This plan item is not assigned to you.')
  const { id, preset, target } = found.item
  return {
    id,
    planId: found.planId,
    planTitle: found.planTitle,
    preset,
    target,
    dueAt: found.dueAt?.toISOString() ?? null,
  }
}
