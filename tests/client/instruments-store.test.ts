// useInstrumentStore: loads the list and presets, keeps exactly one active, surfaces API errors.
import { createPinia, setActivePinia } from 'pinia'
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { useInstrumentStore } from '../../src/stores/instruments'
import type { Instrument } from '../../src/api/instruments'

const base = {
  presetId: null,
  frets: 20,
  scaleLengthMm: 864,
  handedness: 'right',
  accidentals: 'flat',
  referenceHz: 440,
  soundOn: true,
  volume: 0.6,
  createdAt: '2026-12-01T00:00:00.000Z',
} as const
const FOUR: Instrument = {
  ...base,
  id: 'a',
  name: 'Four',
  tuning: [28, 33, 38, 43],
  isActive: true,
}
const FIVE: Instrument = {
  ...base,
  id: 'b',
  name: 'Five',
  tuning: [23, 28, 33, 38, 43],
  isActive: false,
}

function respond(routes: Record<string, { status?: number; body: unknown }>) {
  const fetch = vi.fn(async (url: string, init?: RequestInit) => {
    const route = routes[`${init?.method ?? 'GET'} ${url}`]
    if (!route) throw new Error(`unexpected ${init?.method} ${url}`)
    return new Response(JSON.stringify(route.body), {
      status: route.status ?? 200,
      headers: { 'content-type': 'application/json' },
    })
  })
  vi.stubGlobal('fetch', fetch)
  return fetch
}

beforeEach(() => setActivePinia(createPinia()))
afterEach(() => vi.unstubAllGlobals())

describe('useInstrumentStore', () => {
  it('a load asked for while one is under way shares it (the router starts one for a drill page); force asks again', async () => {
    const fetch = respond({
      'GET /api/instruments': { body: { instruments: [FOUR] } },
      'GET /api/instruments/presets': { body: { presets: [] } },
    })
    const store = useInstrumentStore()
    await Promise.all([store.load(), store.load()])
    const lists = () => fetch.mock.calls.filter(([url]) => url === '/api/instruments').length
    expect(lists()).toBe(1)
    await store.load(true)
    expect(lists()).toBe(2)
    expect(store.active?.id).toBe('a')
  })

  it('load() fills instruments and presets; active is the one the server marks', async () => {
    respond({
      'GET /api/instruments': { body: { instruments: [FOUR, FIVE] } },
      'GET /api/instruments/presets': { body: { presets: [{ id: 'bass-4' }] } },
    })
    const store = useInstrumentStore()
    expect(store.active).toBeNull()
    await store.load()
    expect(store.active?.id).toBe('a')
    expect(store.presets).toHaveLength(1)
    expect(store.loaded).toBe(true)
  })

  it('activate() moves the active mark and puts that instrument first', async () => {
    respond({
      'GET /api/instruments': { body: { instruments: [FOUR, FIVE] } },
      'GET /api/instruments/presets': { body: { presets: [] } },
      'POST /api/instruments/b/activate': { body: { instrument: { ...FIVE, isActive: true } } },
    })
    const store = useInstrumentStore()
    await store.load()
    await store.activate('b')
    expect(store.instruments.map((i) => [i.id, i.isActive])).toEqual([
      ['b', true],
      ['a', false],
    ])
    expect(store.active?.name).toBe('Five')
  })

  it('a refused change keeps the list as it was and exposes the field errors', async () => {
    respond({
      'GET /api/instruments': { body: { instruments: [FOUR] } },
      'GET /api/instruments/presets': { body: { presets: [] } },
      'PATCH /api/instruments/a': {
        status: 400,
        body: {
          error: {
            code: 'invalid_input',
            message: 'This tuning cannot be played.',
            fields: { tuning: ['List the open strings lowest-pitched first.'] },
          },
        },
      },
    })
    const store = useInstrumentStore()
    await store.load()
    await expect(store.update('a', { tuning: [43, 28] })).rejects.toThrow('cannot be played')
    expect(store.error?.fields.tuning).toEqual(['List the open strings lowest-pitched first.'])
    expect(store.instruments[0]!.tuning).toEqual([28, 33, 38, 43])
    expect(store.isLoading).toBe(false)
  })
})
