// /api/assignments/:id/recordings: upload (multipart, field "file" + "planItemId"), play with HTTP
// range requests so the player can seek (…/:recordingId/audio), delete (…/:recordingId).
import type { Router, Request, Response } from 'express'
import multer from 'multer'
import { pipeline } from 'node:stream'
import { requireRole } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { AppError, badRequest } from '../lib/errors'
import { parse, parseRequest } from '../lib/validate'
import {
  AssignmentIdParamsSchema,
  MAX_RECORDING_BYTES,
  RecordingParamsSchema,
  RecordingUploadSchema,
} from './assignments-schema'
import { openRecording, removeRecording, uploadRecording } from './recordings-service'

const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_RECORDING_BYTES, files: 1, fields: 4, fieldSize: 1024, parts: 6 },
  defParamCharset: 'utf8',
}).single('file')

/** Runs multer and turns its errors into client errors (413 beyond the size limit). */
function receiveFile(req: Request, res: Response): Promise<void> {
  return new Promise((resolve, reject) => {
    upload(req, res, (error: unknown) => {
      if (!error) return resolve()
      const e = error as { code?: string; message?: string }
      if (e.code === 'LIMIT_FILE_SIZE') {
        return reject(
          new AppError(
            'too_large',
            `Recordings can be at most ${MAX_RECORDING_BYTES / 1024 / 1024} MB.`,
            413,
          ),
        )
      }
      reject(
        badRequest(`The upload could not be read: ${e.message ?? 'malformed form data'}.`, {
          file: ['Try the upload again.'],
        }),
      )
    })
  })
}

type Opened = Awaited<ReturnType<typeof openRecording>>

/** 200 with the whole file, or 206 with one byte range; 416 when the range lies outside the file. */
function sendAudio(req: Request, res: Response, audio: Opened) {
  res.set({
    'Accept-Ranges': 'bytes',
    'Content-Type': audio.mimeType,
    'Content-Disposition': `inline; filename="${audio.fileName}"`,
    'Cache-Control': 'private, no-cache',
  })
  const ranges = req.range(audio.size, { combine: true })
  if (ranges === -1) {
    res.status(416).set('Content-Range', `bytes */${audio.size}`).end()
    return
  }
  const single =
    Array.isArray(ranges) && ranges.type === 'bytes' && ranges.length === 1 ? ranges[0] : undefined
  if (single) {
    res.status(206).set('Content-Range', `bytes ${single.start}-${single.end}/${audio.size}`)
    res.set('Content-Length', String(single.end - single.start + 1))
  } else {
    res.set('Content-Length', String(audio.size))
  }
  pipeline(audio.read(single), res, (error) => {
    if (error && error.code !== 'ERR_STREAM_PREMATURE_CLOSE')
      req.log?.warn({ err: error }, 'recording stream failed')
  })
}

/** Adds the recording routes to the assignments router (signed in already). */
export function recordingRoutes(ctx: AppContext, router: Router) {
  router.post('/:id/recordings', requireRole('student'), async (req, res) => {
    await receiveFile(req, res)
    const { params, body } = parseRequest(req, {
      params: AssignmentIdParamsSchema,
      body: RecordingUploadSchema,
    })
    if (!req.file)
      throw badRequest('Attach an audio file.', { file: ['Choose a recording to upload.'] })
    const target = { assignmentId: params.id, ...body }
    res.status(201).json({ recording: await uploadRecording(ctx, req.user!, target, req.file) })
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
