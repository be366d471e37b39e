// A plan assigned to one student: its items with progress toward their targets, the recordings the
// student attached, and the comment thread between student and teacher.
import { z } from 'zod'
import type { PlanItem } from './plans'
import type { TargetProgress } from './targets'

export interface RecordingSummary {
  id: string
  /** The plan item it belongs to; null for a free-standing take or a reference for one student. */
  planItemId: string | null
  /** A take the student recorded, or a reference the teacher recorded to play along with. */
  kind: 'take' | 'reference'
  /** Given by the student or the teacher; empty until someone names it. */
  title: string
  mimeType: string
  sizeBytes: number
  originalName: string
  createdAt: string
  /** The recorded length in ms of a take recorded in the browser; null for uploaded files. */
  durationMs: number | null
}

export interface AssignedItem extends PlanItem {
  progress: TargetProgress
  recordings: RecordingSummary[]
  /** The teacher's reference takes on this item (every student assigned the plan hears them). */
  references: RecordingSummary[]
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

export const CommentInputSchema = z.object({
  body: z
    .string()
    .trim()
    .min(1, 'Write a comment first.')
    .max(4000, 'Use at most 4000 characters.'),
})

export interface PlanComment {
  id: string
  assignmentId: string
  author: { id: string; name: string; role: 'teacher' | 'student' }
  body: string
  createdAt: string
}
