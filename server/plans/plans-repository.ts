// Plans, their items and assignments: the only place that knows these tables.
import type { Knex } from 'knex'
import type { DrillPreset } from '../../src/contract/drills'
import type { PracticeTarget } from '../../src/contract/targets'
import type { Db } from '../lib/db'
import type {
  Plan,
  PlanAssignee,
  PlanItem,
  PlanItemInput,
  PlanUpdateInput,
} from '../../src/contract/plans'

interface PlanRow {
  id: string
  teacher_id: string
  title: string
  notes: string
  due_at: Date | null
  created_at: Date
  updated_at: Date
}

interface ItemRow {
  id: string
  plan_id: string
  position: number
  preset: DrillPreset
  target: PracticeTarget
}

export interface PlanRecord extends Omit<Plan, 'items' | 'assignees'> {
  teacherId: string
}

export const toPlanRecord = (row: PlanRow): PlanRecord => ({
  id: row.id,
  teacherId: row.teacher_id,
  title: row.title,
  notes: row.notes,
  dueAt: row.due_at ? row.due_at.toISOString() : null,
  createdAt: row.created_at.toISOString(),
  updatedAt: row.updated_at.toISOString(),
})

const toItem = (row: ItemRow): PlanItem => ({
  id: row.id,
  position: row.position,
  preset: row.preset,
  target: row.target,
})

const itemRow = (planId: string, item: PlanItemInput, position: number) => ({
  plan_id: planId,
  position,
  preset: JSON.stringify(item.preset),
  target: JSON.stringify(item.target),
})

export async function findPlanRecord(db: Db, planId: string): Promise<PlanRecord | null> {
  const row = await db<PlanRow>('plans').where({ id: planId }).first()
  return row ? toPlanRecord(row) : null
}

/** Items of several plans, grouped by plan id, in their order. */
export async function itemsOfPlans(db: Db, planIds: string[]): Promise<Map<string, PlanItem[]>> {
  const rows: ItemRow[] = planIds.length
    ? await db('plan_items').whereIn('plan_id', planIds).orderBy(['plan_id', 'position'])
    : []
  const byPlan = new Map<string, PlanItem[]>()
  for (const row of rows) byPlan.set(row.plan_id, [...(byPlan.get(row.plan_id) ?? []), toItem(row)])
  return byPlan
}

async function assigneesOfPlans(db: Db, planIds: string[]): Promise<Map<string, PlanAssignee[]>> {
  const rows: {
    id: string
    plan_id: string
    student_id: string
    name: string
    assigned_at: Date
  }[] = planIds.length
    ? await db('plan_assignments as a')
        .join('users as u', 'u.id', 'a.student_id')
        .whereIn('a.plan_id', planIds)
        .select('a.id', 'a.plan_id', 'a.student_id', 'u.name', 'a.assigned_at')
        .orderBy('u.name')
    : []
  const byPlan = new Map<string, PlanAssignee[]>()
  for (const r of rows) {
    const assignee = {
      assignmentId: r.id,
      studentId: r.student_id,
      name: r.name,
      assignedAt: r.assigned_at.toISOString(),
    }
    byPlan.set(r.plan_id, [...(byPlan.get(r.plan_id) ?? []), assignee])
  }
  return byPlan
}

/** Complete plans (items and assignees) for the given plan rows. */
async function withDetails(db: Db, records: PlanRecord[]): Promise<Plan[]> {
  const ids = records.map((r) => r.id)
  const [items, assignees] = await Promise.all([itemsOfPlans(db, ids), assigneesOfPlans(db, ids)])
  return records.map(({ teacherId: _teacher, ...plan }) => ({
    ...plan,
    items: items.get(plan.id) ?? [],
    assignees: assignees.get(plan.id) ?? [],
  }))
}

export async function listTeacherPlans(db: Db, teacherId: string): Promise<Plan[]> {
  const rows: PlanRow[] = await db('plans')
    .where({ teacher_id: teacherId })
    .orderBy('updated_at', 'desc')
  return withDetails(db, rows.map(toPlanRecord))
}

export async function findPlan(db: Db, planId: string): Promise<Plan | null> {
  const record = await findPlanRecord(db, planId)
  return record ? ((await withDetails(db, [record]))[0] ?? null) : null
}

export async function insertPlan(
  db: Db | Knex.Transaction,
  teacherId: string,
  input: PlanUpdateInput,
): Promise<string> {
  const [row] = await db('plans')
    .insert({ teacher_id: teacherId, title: input.title, notes: input.notes, due_at: input.dueAt })
    .returning('id')
  const planId = (row as { id: string }).id
  await db('plan_items').insert(input.items.map((item, index) => itemRow(planId, item, index)))
  return planId
}

/** Replaces a plan's fields and items; items keep their id when sent back. Returns removed item ids. */
export async function updatePlan(
  trx: Knex.Transaction,
  planId: string,
  input: PlanUpdateInput,
): Promise<string[]> {
  await trx('plans').where({ id: planId }).update({
    title: input.title,
    notes: input.notes,
    due_at: input.dueAt,
    updated_at: trx.fn.now(),
  })
  const existing: string[] = await trx('plan_items').where({ plan_id: planId }).pluck('id')
  const kept = new Set(
    input.items.map((item) => item.id).filter((id) => id && existing.includes(id)),
  )
  const removed = existing.filter((id) => !kept.has(id))
  if (removed.length) await trx('plan_items').whereIn('id', removed).delete()
  for (const [index, item] of input.items.entries()) {
    const row = itemRow(planId, item, index)
    if (item.id && kept.has(item.id)) await trx('plan_items').where({ id: item.id }).update(row)
    else await trx('plan_items').insert(row)
  }
  return removed
}

export async function deletePlan(db: Db, planId: string) {
  await db('plans').where({ id: planId }).delete()
}

/** The item, its plan and the plan's teacher; null when there is no such item. */
export async function findItemWithPlan(db: Db, itemId: string) {
  const row = (await db('plan_items as i')
    .join('plans as p', 'p.id', 'i.plan_id')
    .where('i.id', itemId)
    .first('i.*', 'p.title', 'p.due_at', 'p.teacher_id')) as
    (ItemRow & { title: string; due_at: Date | null; teacher_id: string }) | undefined
  if (!row) return null
  return {
    item: toItem(row),
    planId: row.plan_id,
    planTitle: row.title,
    dueAt: row.due_at,
    teacherId: row.teacher_id,
  }
}
