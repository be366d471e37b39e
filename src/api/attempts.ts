// /api/attempts endpoints.
import type { AttemptBatchResult, AttemptInput, StoredAttempt } from '../contract/attempts'
import { http } from './http'

export type { AttemptBatchResult, AttemptInput, StoredAttempt }

/** Sends a batch (≤ 200); ids already stored are skipped by the server, so re-sending is safe. */
export const postAttempts = (attempts: AttemptInput[], timeZone?: string) =>
  http.post<AttemptBatchResult>('/attempts', { attempts, ...(timeZone ? { timeZone } : {}) })
