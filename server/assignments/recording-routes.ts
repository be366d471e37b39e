// /api/assignments/:id/recordings: upload (multipart "file" + "planItemId", streamed by
// recording-upload.ts), play with HTTP range requests so the player can seek
// (…/:recordingId/audio), delete (…/:recordingId).
import type { Router, Request } from 'express'
import { requireRole } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { badRequest } from '../lib/errors'
import { parse } from '../lib/validate'
import {
  AssignmentIdParamsSchema,
  RecordingParamsSchema,
  RecordingUploadSchema,
} from './assignments-schema'
import { sendAudio } from './recording-audio'
import { receiveRecording, takeUploadSlot, type StoredUpload } from './recording-upload'
import { recordingStorage } from './recording-storage'
import {
  checkUploader,
  openRecording,
  removeRecording,
  uploadRecording,
} from './recordings-service'

/** Files the streamed take under the item named in the form; a refused take's bytes are deleted. */
async function fileUpload(
  ctx: AppContext,
  req: Request,
  at: { assignmentId: string; upload: StoredUpload | null },
) {
  const { upload } = at
  let body
  try {
    body = parse(RecordingUploadSchema, req)
  } catch (error) {
    if (upload) await recordingStorage(ctx).delete(upload.storageKey)
    throw error
  }
  if (!upload)
    throw badRequest('Attach an audio file.', { file: ['Choose a recording to upload.'] })
  const target = { assignmentId: at.assignmentId, ...body }
  return uploadRecording(ctx, req.user!, target, upload)
}

/** Adds the recording routes to the assignments router (signed in already). */
export function recordingRoutes(ctx: AppContext, router: Router) {
  // Who may upload is settled before a byte of the body is read; the file then streams to storage.
  router.post('/:id/recordings', requireRole('student'), async (req, res) => {
    const { id } = parse(AssignmentIdParamsSchema, req, 'params')
    await checkUploader(ctx, req.user!, id)
    const release = await takeUploadSlot(ctx, req.user!.id)
    try {
      const upload = await receiveRecording(ctx, req, res)
      const recording = await fileUpload(ctx, req, { assignmentId: id, upload })
      res.status(201).json({ recording })
    } finally {
      await release()
    }
  })
  router.get('/:id/recordings/:recordingId/audio', async (req, res) => {
    const { id, recordingId } = parse(RecordingParamsSchema, req, 'params')
    sendAudio(req, res, await openRecording(ctx, req.user!, { assignmentId: id, recordingId }))
  })
  router.delete('/:id/recordings/:recordingId', async (req, res) => {
    const { id, recordingId } = parse(RecordingParamsSchema, req, 'params')
    await removeRecording(ctx, req.user!, { assignmentId: id, recordingId })
    res.status(204).end()
  })
}
