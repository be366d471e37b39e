// Practice plan shapes shared by the API and the client: a plan is a list of drill presets, each
// with a target, a due date, and the students it is assigned to.
import { z } from 'zod'
import {
  DrillPresetSchema,
  PracticeTargetSchema,
  type DrillPreset,
  type PracticeTarget,
} from '../../src/drills/drill-settings'
import { missingPitchClasses, pitchName } from '../../src/theory'
import { presetKeys, type TargetProgress } from './target-progress'

export type { TargetProgress }

export const MAX_PLAN_ITEMS = 20

/** A cycle preset must name its keys and fit them in its window, so the student never meets an error. */
function checkCyclePreset(preset: DrillPreset, ctx: z.RefinementCtx) {
  if (preset.drill !== 'cycle') return
  const keys = presetKeys(preset)
  if (keys.length === 0) {
    ctx.addIssue({
      code: 'custom',
      path: ['preset', 'settings', 'customTonics'],
      message: 'List at least one key for a custom cycle.',
    })
    return
  }
  const { low, high, scale } = preset.settings
  const missing = missingPitchClasses({ low, high, tonics: keys, scale })
  if (missing.length) {
    ctx.addIssue({
      code: 'custom',
      path: ['preset', 'settings', 'high'],
      message: `The window ${pitchName(low)}–${pitchName(high)} is missing ${missing.join(', ')}; widen it.`,
    })
  }
}

export const PlanItemInputSchema = z
  .object({
    /** Present when editing an existing item, so attempts already practised for it still count. */
    id: z.uuid('Not a valid item id.').optional(),
    preset: DrillPresetSchema,
    target: PracticeTargetSchema,
  })
  .superRefine((item, ctx) => {
    checkCyclePreset(item.preset, ctx)
    if (item.target.kind === 'all-keys' && item.preset.drill !== 'cycle') {
      ctx.addIssue({
        code: 'custom',
        path: ['target', 'kind'],
        message: '"Every key" needs a Window Cycle item.',
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

export const PlanIdParamsSchema = z.object({ id: z.uuid('Not a valid plan id.') })
export const PlanItemIdParamsSchema = z.object({ id: z.uuid('Not a valid plan item id.') })
export const PlanStudentParamsSchema = z.object({
  id: z.uuid('Not a valid plan id.'),
  studentId: z.uuid('Not a valid student id.'),
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

export interface RecordingSummary {
  id: string
  planItemId: string
  mimeType: string
  sizeBytes: number
  originalName: string
  createdAt: string
}

export interface AssignedItem extends PlanItem {
  progress: TargetProgress
  recordings: RecordingSummary[]
}

/** One plan assigned to one student, with progress toward each target (student and teacher views). */
export interface Assignment {
  id: string
  planId: string
  title: string
  notes: string
  dueAt: string | null
  assignedAt: string
  teacher: { id: string; name: string }
  student: { id: string; name: string }
  items: AssignedItem[]
  targetsMet: number
  complete: boolean
  overdue: boolean
  commentCount: number
}

/** A ready-made plan from the starter library (the teacher copies and adapts it). */
export interface StarterPlan {
  key: string
  title: string
  notes: string
  items: { preset: DrillPreset; target: PracticeTarget }[]
}
