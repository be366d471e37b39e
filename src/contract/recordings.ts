// Recordings worth reviewing: a take's title, takes that stand free of plan items, the teacher's
// reference takes, and comments pinned to a moment of a take (ms from its start).
import { z } from 'zod'
import type { RecordingSummary } from './assignments'

export const RECORDING_TITLE_MAX = 120
export const PINNED_COMMENT_MAX = 2000
/** The longest a take can be (the database's check on recordings.duration_ms). */
export const LONGEST_TAKE_MS = 3_600_000

export const RecordingTitleSchema = z
  .string('Give the take a title.')
  .trim()
  .max(RECORDING_TITLE_MAX, `Use at most ${RECORDING_TITLE_MAX} characters.`)

/** What may change on a take: its title, and (a student's free take) the teacher it is shared with. */
export const RecordingPatchSchema = z
  .strictObject({
    title: RecordingTitleSchema.optional(),
    shareWith: z.uuid('Choose one of your teachers.').nullable().optional(),
  })
  .refine((patch) => patch.title !== undefined || patch.shareWith !== undefined, {
    message: 'Change the title or who the take is shared with.',
    path: ['title'],
  })
export type RecordingPatch = z.infer<typeof RecordingPatchSchema>

const clock = (ms: number) => {
  const s = Math.floor(ms / 1000)
  return `${Math.floor(s / 60)}:${String(s % 60).padStart(2, '0')}`
}

/**
 * A comment pinned to a moment of a take: the moment lies inside the take (its stored length, or
 * the longest a take can be when the length is unknown).
 */
export function pinnedCommentSchema(lengthMs: number | null) {
  const end = lengthMs ?? LONGEST_TAKE_MS
  return z.strictObject({
    atMs: z
      .number('Pick a moment of the take.')
      .int('Give the moment in whole milliseconds.')
      .min(0, 'The moment lies before the take starts.')
      .max(end, `The take lasts ${clock(end)}; pin the comment inside it.`),
    body: z
      .string('Write the comment first.')
      .trim()
      .min(1, 'Write the comment first.')
      .max(PINNED_COMMENT_MAX, `Use at most ${PINNED_COMMENT_MAX} characters.`),
  })
}
export type PinnedCommentInput = z.infer<ReturnType<typeof pinnedCommentSchema>>

export interface PinnedComment {
  id: string
  recordingId: string
  atMs: number
  body: string
  author: { id: string; name: string; role: 'teacher' | 'student' }
  createdAt: string
}

export interface Person {
  id: string
  name: string
}

/** A take outside the assigned plans: a student's free take, or a teacher's reference. */
export interface RecordingEntry extends RecordingSummary {
  /** The student who recorded it (a take) or whom it is for (a reference for one student). */
  student: Person | null
  /** Who uploaded it: the student, or the teacher of a reference. */
  author: Person
  /** The teacher a student's free take is shared with; null while private. */
  sharedWith: Person | null
  /** The plan and item of a reference on a plan item. */
  planItem: { id: string; planTitle: string } | null
  commentCount: number
}

/** What the signed-in user may do with a take (the server decides; the client shows). */
export interface RecordingRights {
  canRetitle: boolean
  canDelete: boolean
  canComment: boolean
}
