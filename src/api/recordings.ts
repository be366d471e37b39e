// /api/recordings endpoints: upload a take for a plan item, delete it, and the URL the player streams.
import type { RecordingSummary } from '../contract/assignments'
import { http } from './http'

export type { RecordingSummary }

export function uploadRecording(planItemId: string, audio: Blob, fileName: string) {
  const form = new FormData()
  form.append('planItemId', planItemId)
  form.append('file', audio, fileName)
  return http.post<{ recording: RecordingSummary }>('/recordings', form)
}

export const deleteRecording = (id: string) => http.delete<void>(`/recordings/${id}`)

/** Where <audio> streams the recording from (same origin; range requests let it seek). */
export const recordingAudioUrl = (id: string) => `/api/recordings/${id}/audio`
