// The attempts recorder: batching, retry with back-off, a queue in IndexedDB that survives reloads and
// a time offline, and answers the server refuses dropped with a visible error. fetch is stubbed;
// timers are faked; IndexedDB is fake-indexeddb (whose own tasks run on the real clock).
import 'fake-indexeddb/auto'
import { createPinia, setActivePinia } from 'pinia'
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import type { AttemptInput } from '../../src/api/attempts'
import { loadAttempts } from '../../src/stores/attempt-queue'
import {
  BATCH_SIZE,
  FLUSH_DELAY_MS,
  RETRY_BASE_MS,
  useAttemptsStore,
} from '../../src/stores/attempts'
import { useAuthStore } from '../../src/stores/auth'
import { attemptInput } from '../helpers/attempt-input'

const NOOR = {
  id: 'player-1',
  email: 'noor@example.test',
  name: 'Noor',
  role: 'student' as const,
  createdAt: '',
}
let players = 0
/** Noor, with an id of her own in each test: queues of earlier tests never leak in. */
let PLAYER = NOOR

const attempt = () => attemptInput()

type Reply = 'network' | number | { status: number; body: unknown }

/** A fetch that answers each call with the next reply (the last one repeats); records sent bodies. */
function stubFetch(...replies: Reply[]) {
  const bodies: { attempts: AttemptInput[]; timeZone?: string }[] = []
  const statuses: number[] = []
  /** The (fake) clock at each call. */
  const times: number[] = []
  let call = 0
  const fetch = vi.fn(async (_url: string, init: RequestInit) => {
    times.push(Date.now())
    const reply = replies[Math.min(call++, replies.length - 1)]!
    const body = JSON.parse(String(init.body))
    bodies.push(body)
    if (reply === 'network') throw new TypeError('Failed to fetch')
    const { status, body: answer } =
      typeof reply === 'number'
        ? { status: reply, body: { error: { code: 'x', message: 'Server unwell' } } }
        : reply
    statuses.push(status)
    const ok = status < 300 ? { stored: body.attempts.length, duplicates: 0, attempts: [] } : answer
    return new Response(JSON.stringify(ok), {
      status,
      headers: { 'content-type': 'application/json' },
    })
  })
  vi.stubGlobal('fetch', fetch)
  return { fetch, bodies, statuses, times }
}

/** Moves the fake clock on in steps, letting IndexedDB (real tasks) keep up, until `done()`. */
async function runClockUntil(done: () => boolean, stepMs = 100, maxMs = 120_000) {
  for (let ms = 0; ms < maxMs && !done(); ms += stepMs) {
    await new Promise((resolve) => setImmediate(resolve))
    await vi.advanceTimersByTimeAsync(stepMs)
  }
}

function freshStore() {
  setActivePinia(createPinia())
  useAuthStore().user = PLAYER
  return useAttemptsStore()
}

beforeEach(() => {
  players += 1
  PLAYER = { ...NOOR, id: `player-${players}` }
  localStorage.clear()
  // setImmediate stays real: fake-indexeddb runs its work on it.
  vi.useFakeTimers({
    toFake: ['setTimeout', 'clearTimeout', 'setInterval', 'clearInterval', 'Date'],
  })
})
afterEach(() => {
  vi.useRealTimers()
  vi.unstubAllGlobals()
})

describe('attempts recorder', () => {
  it('when sending fails twice and then succeeds, then every answer is sent once, after back-off, with none lost or doubled', async () => {
    const { fetch, bodies } = stubFetch('network', 503, 201)
    const store = freshStore()
    const answers = [attempt(), attempt(), attempt()]
    answers.forEach((a) => store.record(a))

    await store.flush() // 1st try: network error
    expect(store.pending).toBe(3)
    expect(store.lastError?.status).toBe(0)
    await vi.advanceTimersByTimeAsync(1300) // back-off 1 s (+ jitter): 2nd try, 503
    expect(fetch).toHaveBeenCalledTimes(2)
    expect(store.lastError?.status).toBe(503)
    await vi.advanceTimersByTimeAsync(1000)
    expect(fetch).toHaveBeenCalledTimes(2) // back-off doubled to 2 s: not yet
    await vi.advanceTimersByTimeAsync(1300)

    expect(fetch).toHaveBeenCalledTimes(3)
    const accepted = bodies[2]!.attempts.map((a) => a.id)
    expect(accepted).toEqual(answers.map((a) => a.id))
    expect(new Set(accepted).size).toBe(3)
    expect(store.pending).toBe(0)
    expect(store.lastError).toBeNull()
    await vi.advanceTimersByTimeAsync(120_000)
    expect(fetch).toHaveBeenCalledTimes(3) // nothing is sent again
  })

  it('when fewer than 20 answers wait, then they go out together a few seconds later', async () => {
    const { fetch, bodies, times } = stubFetch(201)
    const store = freshStore()
    const start = Date.now()
    store.record(attempt())
    store.record(attempt())

    await runClockUntil(() => fetch.mock.calls.length > 0)

    expect(times[0]! - start).toBeGreaterThanOrEqual(FLUSH_DELAY_MS)
    expect(times[0]! - start).toBeLessThan(FLUSH_DELAY_MS + 500)
    expect(bodies[0]!.attempts).toHaveLength(2)
    expect(bodies[0]!.timeZone).toBeTypeOf('string')
  })

  it('when the 20th answer is recorded, then the batch goes out at once', async () => {
    const { fetch, bodies, times } = stubFetch(201)
    const store = freshStore()
    const start = Date.now()
    for (let i = 0; i < BATCH_SIZE; i++) store.record(attempt())
    await runClockUntil(() => fetch.mock.calls.length > 0, 10)
    expect(fetch).toHaveBeenCalledTimes(1)
    expect(times[0]! - start).toBeLessThan(FLUSH_DELAY_MS / 2) // not the timer's doing
    expect(bodies[0]!.attempts).toHaveLength(BATCH_SIZE)
  })

  it('when the page is reloaded before sending, then the stored answers are sent as the app starts, once', async () => {
    stubFetch('network')
    const first = freshStore()
    const answers = [attempt(), attempt()]
    answers.forEach((a) => first.record(a))
    await first.flush()
    expect(await loadAttempts(PLAYER.id)).toHaveLength(2)

    const { fetch, bodies, times } = stubFetch(201)
    const start = Date.now()
    const reloaded = freshStore() // a new Pinia: what a page reload gives
    await runClockUntil(() => fetch.mock.calls.length > 0, 10, FLUSH_DELAY_MS / 2)
    expect(times[0]! - start).toBeLessThan(FLUSH_DELAY_MS / 2) // on start, not by a timer
    await reloaded.flush()

    expect(bodies[0]!.attempts.map((a) => a.id)).toEqual(answers.map((a) => a.id))
    expect(reloaded.pending).toBe(0)
    expect(await loadAttempts(PLAYER.id)).toEqual([])
    expect(fetch).toHaveBeenCalledTimes(1)
  })

  it('when the network comes back, then the waiting answers go out at once, each once', async () => {
    const { fetch, bodies, times } = stubFetch('network', 201)
    const store = freshStore()
    const answers = [attempt(), attempt(), attempt()]
    answers.forEach((a) => store.record(a))
    await store.flush()
    expect(store.pending).toBe(3)

    const back = Date.now()
    window.dispatchEvent(new Event('online'))
    await runClockUntil(() => store.pending === 0, 10)

    expect(times[1]! - back).toBeLessThan(RETRY_BASE_MS / 2) // not the back-off's doing
    expect(fetch).toHaveBeenCalledTimes(2)
    expect(bodies[1]!.attempts.map((a) => a.id)).toEqual(answers.map((a) => a.id))
    await vi.advanceTimersByTimeAsync(120_000)
    expect(fetch).toHaveBeenCalledTimes(2) // the back-off timer sends nothing again
  })

  it('when an earlier version left a queue in localStorage, then it moves to IndexedDB once and is sent', async () => {
    const legacy = [attempt(), attempt()]
    localStorage.setItem(`ambitus.attempts.v1.${PLAYER.id}`, JSON.stringify(legacy))
    const { fetch, bodies, times } = stubFetch(201)
    const start = Date.now()

    const store = freshStore()
    await runClockUntil(() => fetch.mock.calls.length > 0, 10, FLUSH_DELAY_MS / 2)
    expect(times[0]! - start).toBeLessThan(FLUSH_DELAY_MS / 2) // on start
    await store.flush()

    expect(bodies[0]!.attempts.map((a) => a.id)).toEqual(legacy.map((a) => a.id))
    expect(localStorage.getItem(`ambitus.attempts.v1.${PLAYER.id}`)).toBeNull()
    freshStore() // another start finds nothing left to send
    await vi.advanceTimersByTimeAsync(FLUSH_DELAY_MS * 2)
    expect(fetch).toHaveBeenCalledTimes(1)
  })

  it('when the server refuses one answer of a batch, then only that one is dropped, with a visible error, and the rest are sent', async () => {
    const refusal = {
      status: 400,
      body: {
        error: {
          code: 'invalid_input',
          message: 'Some fields need attention.',
          fields: { 'attempts.1.fret': ['Too high.'] },
        },
      },
    }
    const { bodies } = stubFetch(refusal, 201)
    const store = freshStore()
    const answers = [attempt(), attempt(), attempt()]
    answers.forEach((a) => store.record(a))

    await store.flush()

    expect(bodies).toHaveLength(2)
    expect(bodies[1]!.attempts.map((a) => a.id)).toEqual([answers[0]!.id, answers[2]!.id])
    expect(store.pending).toBe(0)
    expect(store.dropped).toBe(1)
    expect(store.lastError?.message).toContain('One answer could not be saved')
  })

  it('when the server refuses a batch without naming answers, then the batch is dropped and the queue moves on', async () => {
    const { bodies } = stubFetch(
      { status: 400, body: { error: { code: 'invalid_input', message: 'Bad batch.' } } },
      201,
    )
    const store = freshStore()
    store.record(attempt())
    store.record(attempt())
    await store.flush()
    expect(store.pending).toBe(0)
    expect(store.dropped).toBe(2)
    expect(bodies).toHaveLength(1)
    store.record(attempt())
    await store.flush()
    expect(bodies).toHaveLength(2) // later answers still go out
  })

  it('when the session has ended (401), then the answers stay queued for the next sign-in', async () => {
    stubFetch({
      status: 401,
      body: { error: { code: 'unauthorized', message: 'Please sign in.' } },
    })
    const store = freshStore()
    store.record(attempt())
    await store.flush()
    expect(store.pending).toBe(1)
    expect(store.lastError?.status).toBe(401)
    expect(await loadAttempts(PLAYER.id)).toHaveLength(1)
  })

  it('when the page is hidden, then waiting answers are sent without waiting for the timer', async () => {
    const { fetch, times } = stubFetch(201)
    const store = freshStore()
    const start = Date.now()
    store.record(attempt())
    Object.defineProperty(document, 'visibilityState', { value: 'hidden', configurable: true })
    document.dispatchEvent(new Event('visibilitychange'))
    Object.defineProperty(document, 'visibilityState', { value: 'visible', configurable: true })
    await runClockUntil(() => fetch.mock.calls.length > 0, 10)
    expect(fetch).toHaveBeenCalledTimes(1)
    expect(times[0]! - start).toBeLessThan(FLUSH_DELAY_MS / 2)
  })

  it("when another player signs in on this browser, then they never send the first player's answers", async () => {
    const { bodies } = stubFetch('network', 201)
    const store = freshStore()
    store.record(attempt())
    await store.flush()
    const auth = useAuthStore()
    auth.user = { ...PLAYER, id: `${PLAYER.id}-other` }
    await vi.advanceTimersByTimeAsync(0)
    await store.flush()
    expect(store.pending).toBe(0)
    expect(bodies).toHaveLength(1)
    auth.user = PLAYER
    await runClockUntil(() => bodies.length === 2) // sent again for player 1 on their return
    expect(bodies.at(-1)!.attempts).toHaveLength(1)
    await store.flush()
    expect(store.pending).toBe(0)
  })
})
