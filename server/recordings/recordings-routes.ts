// /api/recordings: free takes and reference takes (list, upload, retitle, share, delete), the audio
// of any take one may hear (range requests, so players seek), and comments pinned to its moments.
import { Router, type Request, type Response } from 'express'
import type { z } from 'zod'
import { requireAuth, requireRole } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { badRequest } from '../lib/errors'
import { parse, parseRequest } from '../lib/validate'
import type { PublicUser } from '../users/users-schema'
import { sendAudio } from '../assignments/recording-audio'
import {
  receiveRecording,
  takeUploadSlot,
  type StoredUpload,
} from '../assignments/recording-upload'
import { recordingStorage } from '../assignments/recording-storage'
import { RecordingPatchSchema } from '../../src/contract/recordings'
import {
  PinnedCommentParamsSchema,
  RecordingIdParamsSchema,
  RecordingListQuerySchema,
  ReferenceFieldsSchema,
  TakeFieldsSchema,
} from './recordings-schema'
import * as recordings from './recordings-service'

/** Streams the upload into storage, then parses the form's fields; bad fields drop the bytes. */
async function receive<S extends z.ZodType>(
  ctx: AppContext,
  req: Request,
  res: Response,
  schema: S,
): Promise<{ fields: z.infer<S>; upload: StoredUpload }> {
  const upload = await receiveRecording(ctx, req, res)
  try {
    const fields = parse(schema, req)
    if (!upload)
      throw badRequest('Attach an audio file.', { file: ['Choose a recording to upload.'] })
    return { fields, upload }
  } catch (error) {
    if (upload) await recordingStorage(ctx).delete(upload.storageKey)
    throw error
  }
}

/** Runs an upload inside one of the account's upload slots. */
async function withSlot<T>(ctx: AppContext, user: PublicUser, run: () => Promise<T>) {
  const release = await takeUploadSlot(ctx, user.id)
  try {
    return await run()
  } finally {
    await release()
  }
}

function uploadRoutes(ctx: AppContext, router: Router) {
  router.post('/', requireRole('student'), async (req, res) => {
    const entry = await withSlot(ctx, req.user!, async () => {
      const { fields, upload } = await receive(ctx, req, res, TakeFieldsSchema)
      return recordings.uploadTake(ctx, req.user!, fields, upload)
    })
    res.status(201).json({ recording: entry })
  })
  router.post('/references', requireRole('teacher'), async (req, res) => {
    const entry = await withSlot(ctx, req.user!, async () => {
      const { fields, upload } = await receive(ctx, req, res, ReferenceFieldsSchema)
      return recordings.uploadReference(ctx, req.user!, fields, upload)
    })
    res.status(201).json({ recording: entry })
  })
}

function commentRoutes(ctx: AppContext, router: Router) {
  router.get('/:id/comments', async (req, res) => {
    const { id } = parse(RecordingIdParamsSchema, req, 'params')
    res.json(await recordings.pinnedComments(ctx, req.user!, id))
  })
  router.post('/:id/comments', async (req, res) => {
    const { id } = parse(RecordingIdParamsSchema, req, 'params')
    res.status(201).json({ comment: await recordings.pinComment(ctx, req.user!, id, req.body) })
  })
  router.delete('/:id/comments/:commentId', async (req, res) => {
    await recordings.unpinComment(ctx, req.user!, parse(PinnedCommentParamsSchema, req, 'params'))
    res.status(204).end()
  })
}

export function recordingRoutes(ctx: AppContext) {
  const router = Router()
  router.use(requireAuth(ctx))
  router.get('/', requireRole('student', 'teacher'), async (req, res) => {
    const { student } = parse(RecordingListQuerySchema, req, 'query')
    res.json({ recordings: await recordings.listRecordings(ctx, req.user!, student) })
  })
  router.get('/teachers', requireRole('student'), async (req, res) => {
    res.json({ teachers: await recordings.teachersToShareWith(ctx, req.user!) })
  })
  uploadRoutes(ctx, router)
  router.patch('/:id', async (req, res) => {
    const { params, body } = parseRequest(req, {
      params: RecordingIdParamsSchema,
      body: RecordingPatchSchema,
    })
    res.json({ recording: await recordings.changeRecording(ctx, req.user!, params.id, body) })
  })
  router.delete('/:id', async (req, res) => {
    const { id } = parse(RecordingIdParamsSchema, req, 'params')
    await recordings.removeRecordingById(ctx, req.user!, id)
    res.status(204).end()
  })
  router.get('/:id/audio', async (req, res) => {
    const { id } = parse(RecordingIdParamsSchema, req, 'params')
    sendAudio(req, res, await recordings.audioOf(ctx, req.user!, id))
  })
  commentRoutes(ctx, router)
  return router
}
