// Recording use cases: a student attaches audio to an item of a plan assigned to them; the student
// and the plan's teacher may play it; the student may delete it. Also what every upload shares: the
// format read from the bytes, the length, and deleting the bytes of a refused take.
import { fileTypeFromBuffer } from 'file-type'
import type { AppContext } from '../context'
import { AppError, badRequest, conflict, forbidden, notFound } from '../lib/errors'
import type { PublicUser } from '../users/users-schema'
import { itemInAssignment } from './assignments-repository'
import { ACCEPTED_AUDIO, MAX_RECORDINGS_PER_ITEM } from './assignments-schema'
import { participantAssignment } from './assignments-service'
import { measuredLength } from './recording-length'
import { recordingStorage, type RecordingStorage } from './recording-storage'
import type { StoredUpload } from './recording-upload'
import {
  deleteRecording,
  findRecording,
  insertRecordingBelowLimit,
  toSummary,
  type RecordingRecord,
} from './recordings-repository'

const NOT_YOURS = 'This plan item is not assigned to you.'
const HEAD_BYTES = 4100 // file-type reads at most this many bytes to tell a format

/** The first bytes of a stored take: enough for file-type to recognise any accepted format. */
async function headOf(storage: RecordingStorage, upload: StoredUpload): Promise<Buffer> {
  const chunks: Buffer[] = []
  const end = Math.min(upload.size, HEAD_BYTES) - 1
  for await (const chunk of storage.get(upload.storageKey, { start: 0, end }))
    chunks.push(chunk as Buffer)
  return Buffer.concat(chunks)
}

/** The audio format, read from the bytes themselves (a renamed file does not pass). */
async function audioFormat(storage: RecordingStorage, upload: StoredUpload) {
  if (upload.size === 0)
    throw badRequest('The file is empty.', { file: ['Choose a recording with sound in it.'] })
  const type = await fileTypeFromBuffer(await headOf(storage, upload))
  const mimeType = type ? ACCEPTED_AUDIO[type.ext] : undefined
  if (!type || !mimeType) {
    throw new AppError(
      'unsupported_media',
      'This is not an audio file we can play (WebM, Ogg, MP3, WAV or M4A).',
      415,
      { file: ['Upload WebM, Ogg, MP3, WAV or M4A audio.'] },
    )
  }
  return { mimeType, extension: type.ext }
}

const cleanName = (name: string) =>
  name
    .replace(/[\p{Cc}\\/]+/gu, ' ')
    .trim()
    .slice(0, 200)

/** Checked before the upload is read: only the assigned student may attach takes to it. */
export async function checkUploader(ctx: AppContext, student: PublicUser, assignmentId: string) {
  const assignment = await participantAssignment(ctx, student, assignmentId, NOT_YOURS)
  if (assignment.studentId !== student.id) throw forbidden(NOT_YOURS)
}

/**
 * What a stored upload is: its format (from the bytes), size, name and length — the browser's
 * measured length when it recorded the take, else the length the file itself states.
 */
export async function describeUpload(ctx: AppContext, upload: StoredUpload, durationMs?: number) {
  const storage = recordingStorage(ctx)
  const format = await audioFormat(storage, upload)
  const length =
    durationMs ?? (await measuredLength(storage, { ...upload, mimeType: format.mimeType }))
  return {
    ...format,
    storageKey: upload.storageKey,
    sizeBytes: upload.size,
    originalName: cleanName(upload.originalname),
    durationMs: length,
  }
}

/** Runs the filing of an upload; when it throws, the bytes already stored are deleted. */
export async function fileOrDiscard<T>(
  ctx: AppContext,
  upload: StoredUpload,
  file: () => Promise<T>,
): Promise<T> {
  try {
    return await file()
  } catch (error) {
    await recordingStorage(ctx).delete(upload.storageKey)
    throw error
  }
}

/** The item a take is filed under, its title, and its length as the browser measured it. */
type RecordingTarget = {
  assignmentId: string
  planItemId: string
  durationMs?: number
  title?: string
}

async function fileUnderItem(
  ctx: AppContext,
  student: PublicUser,
  target: RecordingTarget,
  upload: StoredUpload,
) {
  const { assignmentId, planItemId } = target
  if (!(await itemInAssignment(ctx.db, assignmentId, planItemId))) throw notFound('That plan item')
  const described = await describeUpload(ctx, upload, target.durationMs)
  const stored = await insertRecordingBelowLimit(
    ctx.db,
    {
      ...{ assignmentId, planItemId, studentId: student.id, uploadedBy: student.id },
      ...{ sharedWithId: null, kind: 'take', title: target.title ?? '' },
      ...described,
    },
    MAX_RECORDINGS_PER_ITEM,
  )
  if (stored === 'gone') throw notFound('That assigned plan')
  if (stored === 'full') {
    throw conflict(
      `At most ${MAX_RECORDINGS_PER_ITEM} recordings per drill; delete an older one first.`,
    )
  }
  return toSummary(stored)
}

/** Files a take already streamed into storage under its plan item; refused takes are deleted. */
export const uploadRecording = (
  ctx: AppContext,
  student: PublicUser,
  target: RecordingTarget,
  upload: StoredUpload,
) => fileOrDiscard(ctx, upload, () => fileUnderItem(ctx, student, target, upload))

/** The recording of this assignment, when the user is its student or the teacher of its plan. */
async function visibleRecording(
  ctx: AppContext,
  user: PublicUser,
  at: { assignmentId: string; recordingId: string },
): Promise<RecordingRecord> {
  const recording = await findRecording(ctx.db, at.recordingId)
  if (!recording || recording.assignmentId !== at.assignmentId) throw notFound('That recording')
  await participantAssignment(
    ctx,
    user,
    at.assignmentId,
    'Only the student and their teacher can play this recording.',
  )
  return recording
}

/** What the audio route needs: type, size and a way to read (part of) the bytes. */
export async function playable(ctx: AppContext, recording: RecordingRecord) {
  const storage = recordingStorage(ctx)
  const size = await storage.size(recording.storageKey)
  if (size === null) throw notFound('The audio of this recording')
  return {
    mimeType: recording.mimeType,
    fileName: `recording-${recording.createdAt.slice(0, 10)}.${recording.extension}`,
    size,
    read: (range?: { start: number; end: number }) => storage.get(recording.storageKey, range),
  }
}

export async function openRecording(
  ctx: AppContext,
  user: PublicUser,
  at: { assignmentId: string; recordingId: string },
) {
  return playable(ctx, await visibleRecording(ctx, user, at))
}

/** Deletes the recording's row (its pinned comments go with it), then its bytes. */
export async function discardRecording(ctx: AppContext, recording: RecordingRecord) {
  await deleteRecording(ctx.db, recording.id)
  await recordingStorage(ctx).delete(recording.storageKey)
}

export async function removeRecording(
  ctx: AppContext,
  user: PublicUser,
  at: { assignmentId: string; recordingId: string },
) {
  const recording = await visibleRecording(ctx, user, at)
  if (recording.studentId !== user.id)
    throw forbidden('Only the student who recorded it can delete it.')
  await discardRecording(ctx, recording)
}
