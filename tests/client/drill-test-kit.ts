// Shared arrangements for drill view tests: a fake pitch player and a stubbed API (fetch).
import { vi } from 'vitest'
import type { PitchPlayer } from '../../src/audio'
import type { Instrument } from '../../src/api/instruments'

export const NOOR_BASS: Instrument = {
  id: '00000000-0000-4000-8000-000000000004',
  name: 'Sunburst 4-string',
  presetId: 'bass-4',
  tuning: [28, 33, 38, 43], // E1 A1 D2 G2 (common practice)
  frets: 20,
  scaleLengthMm: 864,
  handedness: 'right',
  accidentals: 'flat',
  referenceHz: 440,
  soundOn: true,
  volume: 0.5,
  isActive: true,
  createdAt: '2026-12-01T00:00:00.000Z',
}

export function fakePlayer() {
  const calls: [string, ...unknown[]][] = []
  const record =
    (name: string) =>
    (...args: unknown[]) =>
      void calls.push([name, ...args])
  const player: PitchPlayer = {
    start: async () => void calls.push(['start']),
    play: record('play'),
    playSequence: record('playSequence'),
    startClick: record('startClick'),
    stopClick: record('stopClick'),
    setVolume: record('setVolume'),
    setReferenceHz: record('setReferenceHz'),
    setTuning: record('setTuning'),
    voice: 'synth',
  }
  const named = (name: string) => calls.filter(([n]) => n === name).map((call) => call.slice(1))
  return { player, calls, named, last: (name: string) => named(name).at(-1) }
}

const json = (body: unknown, status = 200) =>
  new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } })

/** Stubs fetch with answers per "METHOD /path" (query ignored); records every request body. */
export function stubApi(answers: Record<string, unknown>) {
  const requests: { method: string; path: string; query: URLSearchParams; body: unknown }[] = []
  const fetch = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = new URL(String(input), 'http://localhost')
    const method = init?.method ?? 'GET'
    const body = typeof init?.body === 'string' ? JSON.parse(init.body) : undefined
    requests.push({ method, path: url.pathname, query: url.searchParams, body })
    const key = `${method} ${url.pathname}`
    if (key in answers) return json(answers[key])
    return json({ error: { code: 'not_found', message: `No stub for ${key}` } }, 404)
  })
  vi.stubGlobal('fetch', fetch)
  return {
    requests,
    sent: (method: string, path: string) =>
      requests.filter((r) => r.method === method && r.path === path),
  }
}

export const INSTRUMENT_ANSWERS = {
  'GET /api/instruments': { instruments: [NOOR_BASS] },
  'GET /api/instruments/presets': { presets: [] },
}

/** What POST /api/attempts answers (the store only needs it to succeed). */
export const ATTEMPTS_OK = { stored: 1, duplicates: 0, attempts: [] }
