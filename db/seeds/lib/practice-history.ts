// Deterministic practice history for a demo student: a few weeks of Neck Recall and Pitch Hunt
// answers that get faster and more accurate, with a planted weak region so the heat map shows it.
import type { DemoInstrument } from './cedar-hollow'

const DAY_MS = 24 * 3600 * 1000
const PITCH_CLASS_NAMES = ['C', 'Db', 'D', 'Eb', 'E', 'F', 'Gb', 'G', 'Ab', 'A', 'Bb', 'B']
const OCTAVE_NAMES = (p: number) => `${PITCH_CLASS_NAMES[p % 12]}${Math.floor(p / 12) - 1}`

/** mulberry32: a small seeded generator, so the demo looks the same on every machine. */
function seededRandom(seed: number) {
  let a = seed >>> 0
  return () => {
    a = (a + 0x6d2b79f5) >>> 0
    let t = a
    t = Math.imul(t ^ (t >>> 15), t | 1)
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61)
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296
  }
}

function uuidFrom(random: () => number): string {
  const hex = Array.from({ length: 32 }, () => Math.floor(random() * 16).toString(16))
  hex[12] = '4'
  hex[16] = ((Math.floor(random() * 4) + 8) as number).toString(16)
  const s = hex.join('')
  return `${s.slice(0, 8)}-${s.slice(8, 12)}-${s.slice(12, 16)}-${s.slice(16, 20)}-${s.slice(20)}`
}

export interface SeedAttempt {
  id: string
  user_id: string
  instrument_id: string
  tuning: number[]
  drill: string
  session_id: string
  string: number
  fret: number
  expected_pitch: number
  answer: string
  correct: boolean
  response_ms: number
  created_at: Date
}

interface HistoryInput {
  userId: string
  instrumentId: string
  instrument: DemoInstrument
  seed: number
  now: Date
  days?: number
  /** The last days without any practice (a student who needs the teacher's attention). */
  restDays?: number
}

/** A weak region: frets 5–9 on the second-highest string are missed more and answered slower. */
function isWeakSpot(instrument: DemoInstrument, string: number, fret: number) {
  return string === instrument.tuning.length - 2 && fret >= 5 && fret <= 9
}

function oneAttempt(
  input: HistoryInput,
  random: () => number,
  progress: number,
  sessionId: string,
  at: Date,
) {
  const { instrument } = input
  const string = Math.floor(random() * instrument.tuning.length)
  const fret = Math.floor(random() * Math.min(instrument.frets, 12) + 1)
  const expected = (instrument.tuning[string] ?? 0) + fret
  const weak = isWeakSpot(instrument, string, fret)
  const pCorrect = weak ? 0.45 + 0.3 * progress : 0.7 + 0.27 * progress
  const correct = random() < pCorrect
  const slow = weak ? 1.8 : 1
  const responseMs = Math.round((3200 - 1500 * progress) * slow * (0.6 + random() * 0.9))
  const drill = random() < 0.6 ? 'recall' : 'hunt'
  const wrong = expected + (random() < 0.5 ? 1 : -1)
  const answerPitch = correct ? expected : wrong
  const answer =
    drill === 'recall' ? PITCH_CLASS_NAMES[answerPitch % 12]! : OCTAVE_NAMES(answerPitch)
  return {
    id: uuidFrom(random),
    user_id: input.userId,
    instrument_id: input.instrumentId,
    tuning: instrument.tuning,
    drill,
    session_id: sessionId,
    string,
    fret,
    expected_pitch: expected,
    answer,
    correct,
    response_ms: responseMs,
    created_at: at,
  }
}

/** Builds the attempts of one student over the last `days` days (most days practised). */
export function practiceHistory(input: HistoryInput): SeedAttempt[] {
  const random = seededRandom(input.seed)
  const days = input.days ?? 28
  const attempts: SeedAttempt[] = []
  for (let day = days; day > (input.restDays ?? 0); day--) {
    if (random() < 0.2) continue
    const progress = (days - day) / days
    const sessionId = uuidFrom(random)
    const start = input.now.getTime() - day * DAY_MS + (17 + Math.floor(random() * 4)) * 3600 * 1000
    const count = 30 + Math.floor(random() * 40)
    let at = start
    for (let i = 0; i < count; i++) {
      const attempt = oneAttempt(input, random, progress, sessionId, new Date(at))
      at += attempt.response_ms + 1200
      attempts.push(attempt)
    }
  }
  return attempts
}
