// Receiving a take: multer streams the file part straight into recording storage (never a 20 MB
// buffer), size-capped; and a per-account cap on uploads in flight across all app processes (429
// beyond UPLOADS_PER_USER).
import type { Request, Response } from 'express'
import multer, { type StorageEngine } from 'multer'
import type { AppContext } from '../context'
import { AppError, badRequest } from '../lib/errors'
import { peek, take, undo } from '../lib/rate-counters'
import { MAX_RECORDING_BYTES } from './assignments-schema'
import { newStorageKey, recordingStorage, type RecordingStorage } from './recording-storage'

/** What the storage engine leaves on req.file: where the bytes went and how many arrived. */
export interface StoredUpload {
  storageKey: string
  size: number
  originalname: string
}

/** A multer storage engine writing into our recording storage under a fresh random key. */
function streamingEngine(storage: RecordingStorage): StorageEngine {
  return {
    _handleFile(_req, file, done) {
      const storageKey = newStorageKey()
      storage.put(storageKey, file.stream).then(
        (size) => done(null, { storageKey, size } as Partial<Express.Multer.File>),
        (error: Error) => done(error),
      )
    },
    _removeFile(_req, file, done) {
      const { storageKey } = file as unknown as StoredUpload
      storage.delete(storageKey).then(() => done(null), done)
    },
  }
}

const LIMITS = { fileSize: MAX_RECORDING_BYTES, files: 1, fields: 4, fieldSize: 1024, parts: 6 }
const uploaders = new WeakMap<AppContext, ReturnType<typeof multer>>()

function uploaderFor(ctx: AppContext) {
  let uploader = uploaders.get(ctx)
  if (!uploader) {
    const storage = streamingEngine(recordingStorage(ctx))
    uploader = multer({ storage, limits: LIMITS, defParamCharset: 'utf8' })
    uploaders.set(ctx, uploader)
  }
  return uploader.single('file')
}

function uploadError(error: { code?: string; message?: string }) {
  if (error.code === 'LIMIT_FILE_SIZE') {
    const mb = MAX_RECORDING_BYTES / 1024 / 1024
    return new AppError('too_large', `Recordings can be at most ${mb} MB.`, 413)
  }
  return badRequest(`The upload could not be read: ${error.message ?? 'malformed form data'}.`, {
    file: ['Try the upload again.'],
  })
}

/** Streams the multipart body into storage; resolves to the stored file, or null without one. */
export function receiveRecording(
  ctx: AppContext,
  req: Request,
  res: Response,
): Promise<StoredUpload | null> {
  return new Promise((resolve, reject) => {
    uploaderFor(ctx)(req, res, (error: unknown) => {
      if (error) return reject(uploadError(error as { code?: string; message?: string }))
      const file = req.file as unknown as StoredUpload | undefined
      resolve(file ? { ...file, originalname: req.file!.originalname } : null)
    })
  })
}

// Slots in flight are a counter in rate_limits, so every app process sees the same count; a process
// that dies mid-upload cannot free its slot, so the count also ends with its window.
const SLOT_WINDOW_MS = 15 * 60 * 1000
const slotKey = (ctx: AppContext, userId: string) => `${ctx.config.rateLimitScope}uploads:${userId}`

/** Takes one of the account's upload slots (429 when all are busy); call the result to free it. */
export async function takeUploadSlot(
  ctx: AppContext,
  userId: string,
): Promise<() => Promise<void>> {
  const key = slotKey(ctx, userId)
  const slot = await take(ctx.db, key, {
    limit: ctx.config.uploadsPerUser,
    windowMs: SLOT_WINDOW_MS,
  })
  if (!slot.allowed) {
    throw new AppError(
      'too_many_uploads',
      'Another recording of yours is still uploading; wait for it to finish, then try again.',
      429,
    )
  }
  let freed = false
  return async () => {
    if (freed) return
    freed = true
    await undo(ctx.db, key)
  }
}

/** How many uploads of the account are in flight now, across processes (tests, diagnostics). */
export async function uploadsInFlight(ctx: AppContext, userId: string) {
  return (await peek(ctx.db, slotKey(ctx, userId)))?.hits ?? 0
}
