// /api/assignments/:id/…: the comment thread and the recordings of one assigned plan.
import type { PlanComment, RecordingSummary } from '../contract/assignments'
import { http } from './http'

export type { PlanComment, RecordingSummary }

const base = (assignmentId: string) => `/assignments/${assignmentId}`

export const listComments = (assignmentId: string) =>
  http.get<{ comments: PlanComment[] }>(`${base(assignmentId)}/comments`)
export const postComment = (assignmentId: string, body: string) =>
  http.post<{ comment: PlanComment }>(`${base(assignmentId)}/comments`, { body })
export const deleteComment = (assignmentId: string, commentId: string) =>
  http.delete<void>(`${base(assignmentId)}/comments/${commentId}`)

/** Attaches a take to an item of the assigned plan (multipart: planItemId, durationMs?, file). */
export function uploadRecording(
  assignmentId: string,
  planItemId: string,
  audio: Blob,
  fileName: string,
  durationMs?: number,
) {
  const form = new FormData()
  form.append('planItemId', planItemId)
  if (durationMs) form.append('durationMs', String(Math.round(durationMs)))
  form.append('file', audio, fileName)
  return http.post<{ recording: RecordingSummary }>(`${base(assignmentId)}/recordings`, form)
}

export const deleteRecording = (assignmentId: string, recordingId: string) =>
  http.delete<void>(`${base(assignmentId)}/recordings/${recordingId}`)

/** Where <audio> streams the recording from (same origin; range requests let it seek). */
export const recordingAudioUrl = (assignmentId: string, recordingId: string) =>
  `/api${base(assignmentId)}/recordings/${recordingId}/audio`
