// Arranging practice history for API tests: students with an instrument, attempts at given times.
import { randomUUID } from 'node:crypto'
import type { Express } from 'express'
import { signedInAgent } from './api'

export type Agent = Awaited<ReturnType<typeof signedInAgent>>['agent']

export interface Practiser {
  agent: Agent
  email: string
  user: { id: string; email: string; role: string }
  instrumentId: string
  tuning: number[]
}

/** A signed-in student with their default instrument (created on first read of /api/instruments). */
export async function practiser(
  app: Express,
  role: 'student' | 'teacher' = 'student',
): Promise<Practiser> {
  const s = await signedInAgent(app, role)
  const res = await s.agent.get('/api/instruments')
  const instrument = res.body.instruments[0] as { id: string; tuning: number[] }
  return { ...s, instrumentId: instrument.id, tuning: instrument.tuning }
}

export interface Answer {
  string: number | null
  fret: number | null
  correct: boolean
  ms: number
  /** ISO instant of the answer. */
  at: string
  drill?: string
  pitch?: number
  detail?: Record<string, string | number | boolean | null>
  /** 'shown' for a "show me" (default: answered). */
  outcome?: 'answered' | 'shown'
  planItemId?: string | null
}

/** An attempt body for the contract of POST /api/attempts. */
export function attemptBody(
  p: Pick<Practiser, 'instrumentId' | 'tuning'>,
  sessionId: string,
  a: Answer,
) {
  const pitch =
    a.pitch ?? (a.string !== null && a.fret !== null ? (p.tuning[a.string] ?? 0) + a.fret : 40)
  return {
    id: randomUUID(),
    instrumentId: p.instrumentId,
    tuning: p.tuning,
    drill: a.drill ?? 'recall',
    sessionId,
    string: a.string,
    fret: a.fret,
    expectedPitch: pitch,
    answer: a.correct ? 'right' : 'wrong',
    correct: a.correct,
    responseMs: a.ms,
    createdAt: a.at,
    detail: a.detail ?? {},
    planItemId: a.planItemId ?? null,
    ...(a.outcome ? { outcome: a.outcome } : {}),
  }
}

/** Posts one session's answers (in batches of `batchSize`) and fails loudly if the API refuses. */
export async function practise(
  p: Practiser,
  answers: Answer[],
  options: { timeZone?: string; batchSize?: number } = {},
) {
  const sessionId = randomUUID()
  const all = answers.map((a) => attemptBody(p, sessionId, a))
  const size = options.batchSize ?? 200
  for (let i = 0; i < all.length; i += size) {
    const res = await p.agent
      .post('/api/attempts')
      .send({ attempts: all.slice(i, i + size), timeZone: options.timeZone ?? 'UTC' })
    if (res.status !== 201)
      throw new Error(`attempts refused: ${res.status} ${JSON.stringify(res.body)}`)
  }
  return all
}

/** The calendar day (UTC) `days` before today, and an instant on it. */
export function utcDay(daysAgo: number) {
  const d = new Date()
  d.setUTCDate(d.getUTCDate() - daysAgo)
  return d.toISOString().slice(0, 10)
}
export const at = (day: string, time: string) => `${day}T${time}.000Z`
