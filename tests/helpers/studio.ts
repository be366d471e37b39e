// Arrange helpers for the studio tests: a teacher with a studio and students, plans, attempts, audio.
import { randomUUID } from 'node:crypto'
import type { Express } from 'express'
import type { AppContext } from '../../server/context'
import { wavBytes } from '../../scripts/lib/wav'
import { signedInAgent } from './api'

export type Agent = Awaited<ReturnType<typeof signedInAgent>>

/** A signed-in teacher with a new studio. */
export async function teacherWithStudio(app: Express, name = 'Test Teacher') {
  const teacher = await signedInAgent(app, 'teacher', name)
  const res = await teacher.agent.post('/api/studio/studios').send({ name: `Studio of ${name}` })
  if (res.status !== 201) throw new Error(`studio: ${res.status} ${JSON.stringify(res.body)}`)
  return { ...teacher, studioId: res.body.studio.id as string }
}

/** Puts a student straight into a studio (invitations have their own tests). */
export async function joinStudio(ctx: AppContext, studioId: string, studentId: string) {
  await ctx.db('studio_members').insert({ studio_id: studioId, student_id: studentId })
}

/** A signed-in student who is already a member of the studio. */
export async function studentIn(
  app: Express,
  ctx: AppContext,
  studioId: string,
  name = 'Test Student',
) {
  const student = await signedInAgent(app, 'student', name)
  await joinStudio(ctx, studioId, student.user.id)
  return student
}

export const RECALL_ITEM = {
  preset: {
    drill: 'recall',
    settings: { region: { lowString: 0, highString: 3, lowFret: 0, highFret: 5 } },
  },
  target: { kind: 'accuracy', minAccuracy: 0.75, maxMedianMs: 2000, minAttempts: 4 },
}

export const CYCLE_ITEM = {
  preset: {
    drill: 'cycle',
    settings: {
      low: 33,
      high: 45,
      scale: 'major',
      cycle: 'custom',
      customTonics: ['C', 'F', 'Bb'],
    },
  },
  target: { kind: 'all-keys' },
}

export function planBody(overrides: Record<string, unknown> = {}) {
  return {
    title: 'Week 1: first position',
    notes: 'Slowly, then faster.',
    dueAt: new Date(Date.now() + 5 * 24 * 3600 * 1000).toISOString(),
    items: [RECALL_ITEM],
    ...overrides,
  }
}

/** Creates a plan as the teacher and returns it (with item ids and assignees). */
export async function createPlan(teacher: Agent, overrides: Record<string, unknown> = {}) {
  const res = await teacher.agent.post('/api/plans').send(planBody(overrides))
  if (res.status !== 201) throw new Error(`plan: ${res.status} ${JSON.stringify(res.body)}`)
  return res.body.plan as {
    id: string
    items: { id: string }[]
    assignees: { assignmentId: string; studentId: string }[]
  }
}

export interface TestAttempt {
  correct: boolean
  responseMs: number
  sessionId?: string
  minutesAgo?: number
  drill?: string
  detail?: Record<string, unknown>
  string?: number | null
  fret?: number | null
}

/** The student's 4-string bass (E1 A1 D2 G2), created on first use. */
async function bassOf(ctx: AppContext, userId: string): Promise<string> {
  const found = await ctx.db('instruments').where({ user_id: userId }).first('id')
  if (found) return found.id
  const [row] = await ctx
    .db('instruments')
    .insert({
      user_id: userId,
      name: 'Test bass',
      tuning: [28, 33, 38, 43],
      frets: 20,
      scale_length_mm: 864,
      is_active: true,
    })
    .returning('id')
  return row.id
}

/** Stores answers as if the drill views had sent them (the attempts API has its own tests). */
export async function insertAttempts(
  ctx: AppContext,
  userId: string,
  planItemId: string | null,
  attempts: TestAttempt[],
) {
  const session = randomUUID()
  const tuning = [28, 33, 38, 43] // E1 A1 D2 G2
  const instrumentId = await bassOf(ctx, userId)
  await ctx.db('attempts').insert(
    attempts.map((a, i) => ({
      id: randomUUID(),
      user_id: userId,
      instrument_id: instrumentId,
      tuning,
      drill: a.drill ?? 'recall',
      session_id: a.sessionId ?? session,
      string: a.string === undefined ? 1 : a.string,
      fret: a.fret === undefined ? 3 : a.fret,
      expected_pitch: (tuning[a.string ?? 1] ?? 36) + (a.fret ?? 3),
      answer: a.correct ? 'C' : 'D',
      correct: a.correct,
      response_ms: a.responseMs,
      created_at: new Date(Date.now() - (a.minutesAgo ?? attempts.length - i) * 60_000),
      detail: JSON.stringify(a.detail ?? {}),
      plan_item_id: planItemId,
    })),
  )
}

/** A real, playable 16-bit mono PCM WAV file of a 440 Hz tone. */
export function wavFile(samples = 800, rate = 8000): Buffer {
  const tone = Float32Array.from(
    { length: samples },
    (_, i) => (8000 / 32767) * Math.sin((2 * Math.PI * 440 * i) / rate),
  )
  return wavBytes(tone, rate)
}

/** The first page of an Ogg Opus stream: capture pattern, page header with CRC, OpusHead packet. */
export function oggOpusFile(): Buffer {
  const head = Buffer.from([
    0x4f, 0x70, 0x75, 0x73, 0x48, 0x65, 0x61, 0x64, 1, 1, 0x38, 1, 0x80, 0xbb, 0, 0, 0, 0, 0,
  ])
  const page = Buffer.alloc(27 + 1 + head.length)
  page.write('OggS', 0)
  page[5] = 0x02 // beginning of stream
  page.writeUInt32LE(0x1234, 14) // serial number
  page[26] = 1 // one segment
  page[27] = head.length
  head.copy(page, 28)
  page.writeUInt32LE(oggCrc(page), 22)
  return page
}

function oggCrc(bytes: Buffer): number {
  let crc = 0
  for (const byte of bytes) {
    crc ^= byte << 24
    for (let k = 0; k < 8; k++)
      crc = crc & 0x80000000 ? ((crc << 1) ^ 0x04c11db7) >>> 0 : (crc << 1) >>> 0
  }
  return crc >>> 0
}
