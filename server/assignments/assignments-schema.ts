// The routes of an assigned plan: its id, a comment's and a recording's; recording limits and the
// audio formats accepted (checked by content, not by name). Bodies and answers: src/contract/assignments.ts.
import { z } from 'zod'
import { RecordingTitleSchema } from '../../src/contract/recordings'

export const AssignmentIdParamsSchema = z.object({ id: z.uuid('Not a valid assignment id.') })
export const CommentIdParamsSchema = z.object({
  id: z.uuid('Not a valid assignment id.'),
  commentId: z.uuid('Not a valid comment id.'),
})

export const MAX_RECORDING_BYTES = 20 * 1024 * 1024
export const MAX_RECORDINGS_PER_ITEM = 10

/** file-type's extension → the Content-Type the recording is served with. */
export const ACCEPTED_AUDIO: Readonly<Record<string, string>> = {
  webm: 'audio/webm',
  ogg: 'audio/ogg',
  oga: 'audio/ogg',
  opus: 'audio/ogg',
  mp3: 'audio/mpeg',
  wav: 'audio/wav',
  m4a: 'audio/mp4',
  // Safari's MediaRecorder writes audio-only MP4 with a generic brand.
  mp4: 'audio/mp4',
}

/** Longest take the browser records (useMediaRecorder stops at 10 minutes), with slack. */
export const MAX_RECORDING_MS = 11 * 60 * 1000

/** The recorded length, sent with takes recorded in the browser. */
export const TakeLengthSchema = z.coerce
  .number('Give the length in milliseconds.')
  .int('Give the length in whole milliseconds.')
  .min(1, 'A take lasts at least a millisecond.')
  .max(MAX_RECORDING_MS, 'Takes recorded here last at most 10 minutes.')
  .optional()

export const RecordingUploadSchema = z.object({
  planItemId: z.uuid('Not a valid plan item id.'),
  durationMs: TakeLengthSchema,
  title: RecordingTitleSchema.optional(),
})
export const RecordingParamsSchema = z.object({
  id: z.uuid('Not a valid assignment id.'),
  recordingId: z.uuid('Not a valid recording id.'),
})
