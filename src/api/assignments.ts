// /api/assignments/:id/…: the comment thread and the recordings of one assigned plan.
import type { PlanComment, RecordingSummary } from '../contract/assignments'
import { http } from './http'
import type { TakeUpload } from './recordings'

export type { PlanComment, RecordingSummary }

const base = (assignmentId: string) => `/assignments/${assignmentId}`

export const listComments = (assignmentId: string) =>
  http.get<{ comments: PlanComment[] }>(`${base(assignmentId)}/comments`)
export const postComment = (assignmentId: string, body: string) =>
  http.post<{ comment: PlanComment }>(`${base(assignmentId)}/comments`, { body })
export const deleteComment = (assignmentId: string, commentId: string) =>
  http.delete<void>(`${base(assignmentId)}/comments/${commentId}`)

/** Attaches a take to an item of the assigned plan (multipart: planItemId, title?, durationMs?, file). */
export function uploadRecording(assignmentId: string, planItemId: string, take: TakeUpload) {
  const form = new FormData()
  form.append('planItemId', planItemId)
  if (take.title) form.append('title', take.title)
  if (take.durationMs) form.append('durationMs', String(Math.round(take.durationMs)))
  form.append('file', take.audio, take.fileName)
  return http.post<{ recording: RecordingSummary }>(`${base(assignmentId)}/recordings`, form)
}

export const deleteRecording = (assignmentId: string, recordingId: string) =>
  http.delete<void>(`${base(assignmentId)}/recordings/${recordingId}`)
