// /api/recordings: free takes and reference takes, titles and sharing, audio, pinned comments.
import type {
  PinnedComment,
  PinnedCommentInput,
  Person,
  RecordingEntry,
  RecordingPatch,
  RecordingRights,
} from '../contract/recordings'
import { http } from './http'

export type { PinnedComment, Person, RecordingEntry, RecordingRights }

/** A take to upload: the audio, its file name, its title and its length when recorded here. */
export interface TakeUpload {
  audio: Blob
  fileName: string
  title: string
  durationMs?: number
}

/** The multipart form of an upload: the text fields first, the file last (the server streams it). */
function takeForm(take: TakeUpload, fields: Record<string, string | undefined>) {
  const form = new FormData()
  if (take.title) form.append('title', take.title)
  if (take.durationMs) form.append('durationMs', String(Math.round(take.durationMs)))
  for (const [name, value] of Object.entries(fields)) if (value) form.append(name, value)
  form.append('file', take.audio, take.fileName)
  return form
}

export const listRecordings = (student?: string) =>
  http.get<{ recordings: RecordingEntry[] }>('/recordings', { query: { student } })
export const listTeachers = () => http.get<{ teachers: Person[] }>('/recordings/teachers')

export const uploadTake = (take: TakeUpload, shareWith?: string) =>
  http.post<{ recording: RecordingEntry }>('/recordings', takeForm(take, { shareWith }))
export const uploadReference = (
  take: TakeUpload,
  on: { planItemId?: string; studentId?: string },
) => http.post<{ recording: RecordingEntry }>('/recordings/references', takeForm(take, on))

export const patchRecording = (id: string, patch: RecordingPatch) =>
  http.patch<{ recording: RecordingEntry }>(`/recordings/${id}`, patch)
export const deleteRecording = (id: string) => http.delete<void>(`/recordings/${id}`)

export const listPinned = (id: string) =>
  http.get<{ comments: PinnedComment[]; rights: RecordingRights }>(`/recordings/${id}/comments`)
export const pinComment = (id: string, input: PinnedCommentInput) =>
  http.post<{ comment: PinnedComment }>(`/recordings/${id}/comments`, input)
export const unpinComment = (id: string, commentId: string) =>
  http.delete<void>(`/recordings/${id}/comments/${commentId}`)

/** Where the player streams a take from (same origin; range requests let it seek). */
export const takeAudioUrl = (id: string) => `/api/recordings/${id}/audio`
