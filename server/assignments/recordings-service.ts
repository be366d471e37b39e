// Recording use cases: a student attaches audio to an item of a plan assigned to them; the student
// and the plan's teacher may play it; the student may delete it.
import { fileTypeFromBuffer } from 'file-type'
import { Readable } from 'node:stream'
import type { AppContext } from '../context'
import { AppError, badRequest, conflict, forbidden, notFound } from '../lib/errors'
import type { PublicUser } from '../users/users-schema'
import { itemInAssignment } from './assignments-repository'
import { ACCEPTED_AUDIO, MAX_RECORDINGS_PER_ITEM } from './assignments-schema'
import { participantAssignment } from './assignments-service'
import { newStorageKey, recordingStorage } from './recording-storage'
import {
  countItemRecordings,
  deleteRecording,
  findRecording,
  insertRecording,
  toSummary,
  type RecordingRecord,
} from './recordings-repository'

const NOT_YOURS = 'This plan item is not assigned to you.'

export interface UploadedFile {
  buffer: Buffer
  originalname: string
}

/** The audio format, read from the bytes themselves (a renamed file does not pass). */
async function audioFormat(buffer: Buffer) {
  if (buffer.length === 0)
    throw badRequest('The file is empty.', { file: ['Choose a recording with sound in it.'] })
  const type = await fileTypeFromBuffer(buffer)
  const mimeType = type ? ACCEPTED_AUDIO[type.ext] : undefined
  if (!type || !mimeType) {
    throw new AppError(
      'unsupported_media',
      'This is not an audio file we can play (WebM, Ogg, MP3, WAV or M4A).',
      415,
      {
        file: ['Upload WebM, Ogg, MP3, WAV or M4A audio.'],
      },
    )
  }
  return { mimeType, extension: type.ext }
}

const cleanName = (name: string) =>
  name
    .replace(/[\p{Cc}\\/]+/gu, ' ')
    .trim()
    .slice(0, 200)

export async function uploadRecording(
  ctx: AppContext,
  student: PublicUser,
  target: { assignmentId: string; planItemId: string; durationMs?: number },
  file: UploadedFile,
) {
  const { assignmentId, planItemId } = target
  const assignment = await participantAssignment(ctx, student, assignmentId, NOT_YOURS)
  if (assignment.studentId !== student.id) throw forbidden(NOT_YOURS)
  if (!(await itemInAssignment(ctx.db, assignmentId, planItemId))) throw notFound('That plan item')
  const format = await audioFormat(file.buffer)
  if ((await countItemRecordings(ctx.db, assignmentId, planItemId)) >= MAX_RECORDINGS_PER_ITEM) {
    throw conflict(
      `At most ${MAX_RECORDINGS_PER_ITEM} recordings per drill; delete an older one first.`,
    )
  }
  const storage = recordingStorage(ctx)
  const storageKey = newStorageKey()
  const sizeBytes = await storage.put(storageKey, Readable.from(file.buffer))
  try {
    const record = await insertRecording(ctx.db, {
      assignmentId,
      planItemId,
      studentId: student.id,
      storageKey,
      sizeBytes,
      originalName: cleanName(file.originalname),
      durationMs: target.durationMs ?? null,
      ...format,
    })
    return toSummary(record)
  } catch (error) {
    await storage.delete(storageKey)
    throw error
  }
}

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
export async function openRecording(
  ctx: AppContext,
  user: PublicUser,
  at: { assignmentId: string; recordingId: string },
) {
  const recording = await visibleRecording(ctx, user, at)
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

export async function removeRecording(
  ctx: AppContext,
  user: PublicUser,
  at: { assignmentId: string; recordingId: string },
) {
  const recording = await visibleRecording(ctx, user, at)
  if (recording.studentId !== user.id)
    throw forbidden('Only the student who recorded it can delete it.')
  await deleteRecording(ctx.db, recording.id)
  await recordingStorage(ctx).delete(recording.storageKey)
}
