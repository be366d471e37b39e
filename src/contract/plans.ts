// Practice plans: a plan is a list of drill presets, each with a target, a due date, and the students
// it is assigned to. The input schemas check what a teacher sends; the interfaces are what the API
// answers.
import { z } from 'zod'
import { DrillPresetSchema, drillContract, type DrillContract, type DrillPreset } from './drills'
import {
  allKeysDrillNames,
  offersAllKeys,
  PracticeTargetSchema,
  type PracticeTarget,
} from './targets'

export const MAX_PLAN_ITEMS = 20

// What would stop a student practising this item (e.g. a cycle that does not fit its window).
function checkPreset(preset: DrillPreset, ctx: z.RefinementCtx) {
  const contract = drillContract(preset.drill) as DrillContract
  for (const issue of contract.presetIssues?.(preset.settings) ?? [])
    ctx.addIssue({
      code: 'custom',
      path: ['preset', 'settings', ...issue.path],
      message: issue.message,
    })
}

export const PlanItemInputSchema = z
  .object({
    /** Present when editing an existing item, so attempts already practised for it still count. */
    id: z.uuid('Not a valid item id.').optional(),
    preset: DrillPresetSchema,
    target: PracticeTargetSchema,
  })
  .superRefine((item, ctx) => {
    checkPreset(item.preset, ctx)
    if (item.target.kind === 'all-keys' && !offersAllKeys(item.preset.drill)) {
      ctx.addIssue({
        code: 'custom',
        path: ['target', 'kind'],
        message: `"Every key" needs a ${allKeysDrillNames()} item.`,
      })
    }
  })
export type PlanItemInput = z.infer<typeof PlanItemInputSchema>

const PlanFields = {
  title: z.string().trim().min(1, 'Give the plan a title.').max(120, 'Use at most 120 characters.'),
  notes: z.string().trim().max(4000, 'Use at most 4000 characters.').default(''),
  dueAt: z.iso.datetime({ offset: true, message: 'Choose a due date.' }).nullable().default(null),
  items: z
    .array(PlanItemInputSchema)
    .min(1, 'Add at least one drill.')
    .max(MAX_PLAN_ITEMS, `At most ${MAX_PLAN_ITEMS} drills per plan.`),
}

export const StudentIdsSchema = z
  .array(z.uuid('Not a valid student id.'))
  .max(200, 'At most 200 students at once.')

/** POST /api/plans: a new plan, optionally assigned straight away. */
export const PlanCreateSchema = z.object({
  ...PlanFields,
  studentIds: StudentIdsSchema.default([]),
})
export type PlanCreateInput = z.infer<typeof PlanCreateSchema>

/** PUT /api/plans/:id: the whole plan (items without an id are new; missing items are removed). */
export const PlanUpdateSchema = z.object(PlanFields)
export type PlanUpdateInput = z.infer<typeof PlanUpdateSchema>

export const AssignSchema = z.object({
  studentIds: StudentIdsSchema.min(1, 'Choose at least one student.'),
})

export interface PlanItem {
  id: string
  position: number
  preset: DrillPreset
  target: PracticeTarget
}

export interface PlanAssignee {
  assignmentId: string
  studentId: string
  name: string
  assignedAt: string
  /** How far this student is (in the plans list; absent in a single plan's answer). */
  progress?: AssigneeProgress
}

/** One student's way through an assigned plan. */
export interface AssigneeProgress {
  targetsMet: number
  targetsTotal: number
  /** 0–1: the mean of the items' progress toward their targets (1 when every target is met). */
  share: number
  complete: boolean
  overdue: boolean
}

/** A plan as its teacher sees it in the editor. */
export interface Plan {
  id: string
  title: string
  notes: string
  dueAt: string | null
  createdAt: string
  updatedAt: string
  items: PlanItem[]
  assignees: PlanAssignee[]
}

/** GET /api/plans/items/:id: what a drill view needs to run a plan item. */
export interface PlanItemContext {
  id: string
  planId: string
  planTitle: string
  preset: DrillPreset
  target: PracticeTarget
  dueAt: string | null
}

/** A ready-made plan from the starter library (the teacher copies and adapts it). */
export interface StarterPlan {
  key: string
  title: string
  notes: string
  items: { preset: DrillPreset; target: PracticeTarget }[]
}
