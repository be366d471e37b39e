// The attempts recorder: drills call record() for every graded answer; answers wait in a queue kept in
// IndexedDB (per player, attempt-queue.ts) and go to POST /api/attempts in batches — every few
// seconds, at 20 answers, on flush(), when the page is hidden and when the network comes back.
// Network and server errors are retried with exponential back-off; answers the server refuses (400)
// are dropped with a visible error, so one bad answer never blocks the rest. The server ignores ids
// it already has, so re-sending (another tab, a lost reply) is safe.
import { defineStore } from 'pinia'
import { computed, ref, watch, type Ref } from 'vue'
import { postAttempts, type AttemptInput } from '../api/attempts'
import { ApiError } from '../api/http'
import { loadAttempts, removeAttempts, saveAttempts } from './attempt-queue'
import { useAuthStore } from './auth'

export const FLUSH_DELAY_MS = 3000
export const BATCH_SIZE = 20
/** The server takes at most 200 per request; a backlog goes out in chunks this size. */
export const MAX_BATCH = 200
export const RETRY_BASE_MS = 1000
export const RETRY_MAX_MS = 60_000

const queueOwner = (userId: string | null) => userId ?? 'signed-out'

/** The stored queue, then answers recorded while it loaded (each id once). */
function merged(stored: AttemptInput[], recorded: AttemptInput[]) {
  const ids = new Set(stored.map((a) => a.id))
  return [...stored, ...recorded.filter((a) => !ids.has(a.id))]
}

/** Indices of the attempts a 400 names ("attempts.3.fret"); empty when the whole batch was refused. */
function refusedIndices(error: ApiError): Set<number> {
  const indices = Object.keys(error.fields)
    .map((key) => /^attempts\.(\d+)\./.exec(key)?.[1])
    .filter((i): i is string => i !== undefined)
    .map(Number)
  return new Set(indices)
}

const isRetryable = (e: ApiError) =>
  e.status === 0 || e.status === 408 || e.status === 429 || e.status >= 500

const localTimeZone = () => {
  try {
    return Intl.DateTimeFormat().resolvedOptions().timeZone
  } catch {
    return undefined
  }
}

// One set of page listeners for the app's one recorder (the latest store created).
let flushNow: (() => Promise<void>) | null = null
if (typeof document !== 'undefined') {
  document.addEventListener('visibilitychange', () => {
    if (document.visibilityState === 'hidden') void flushNow?.()
  })
  window.addEventListener('pagehide', () => void flushNow?.())
  window.addEventListener('online', () => void flushNow?.())
}

// The recorder's state: the queue and what is shown (refs), and the timers and counters of sending.
interface Recorder {
  owner: Ref<string | null>
  queue: Ref<AttemptInput[]>
  isSending: Ref<boolean>
  lastError: Ref<ApiError | null>
  /** Answers the server refused and that were dropped (shown with lastError). */
  dropped: Ref<number>
  // A refusal stays on screen until cleared; a transient send error clears itself on success.
  errorIsRefusal: boolean
  flushTimer?: ReturnType<typeof setTimeout>
  retryTimer?: ReturnType<typeof setTimeout>
  failures: number
  inFlight: Promise<void> | null
  // IndexedDB writes run one after another, in the order the queue changed.
  writes: Promise<void>
  /** The stored queue loading; resolves to how many answers came from an earlier visit. */
  loading: Promise<number>
}

function store(r: Recorder, work: () => Promise<void>) {
  // Blocked or full storage: the answers stay in memory and are still sent.
  r.writes = r.writes.then(work).catch(() => undefined)
}

/** Loads a player's stored queue into memory; resolves to how many came from an earlier visit. */
async function load(r: Recorder, userId: string | null) {
  const stored = await loadAttempts(queueOwner(userId)).catch(() => [])
  if (userId !== r.owner.value) return 0
  const recordedNow = new Set(r.queue.value.map((a) => a.id))
  r.queue.value = merged(stored, r.queue.value)
  return stored.filter((a) => !recordedNow.has(a.id)).length
}

/** Starts loading a player's queue; answers left from an earlier visit (e.g. offline) go out at once. */
function startLoading(r: Recorder, userId: string | null) {
  r.loading = load(r, userId)
  void r.loading.then((earlier) => {
    if (earlier && userId) void flush(r)
  })
}

function schedule(r: Recorder, delayMs: number) {
  clearTimeout(r.flushTimer)
  r.flushTimer = setTimeout(() => void flush(r), delayMs)
}

/** Queues one graded answer (the caller sets id with crypto.randomUUID() and createdAt). */
function record(r: Recorder, attempt: AttemptInput) {
  r.queue.value = [...r.queue.value, attempt]
  const who = queueOwner(r.owner.value)
  store(r, () => saveAttempts(who, [attempt]))
  if (r.retryTimer || r.inFlight) return // the back-off or the send under way will take it
  if (r.queue.value.length >= BATCH_SIZE) void flush(r)
  else schedule(r, FLUSH_DELAY_MS)
}

function remove(r: Recorder, sent: AttemptInput[]) {
  const ids = new Set(sent.map((a) => a.id))
  r.queue.value = r.queue.value.filter((a) => !ids.has(a.id))
  store(r, () => removeAttempts([...ids]))
}

function dropRefused(r: Recorder, batch: AttemptInput[], error: ApiError) {
  const named = refusedIndices(error)
  const refused = named.size ? batch.filter((_, i) => named.has(i)) : batch
  remove(r, refused)
  r.dropped.value += refused.length
  const what = refused.length === 1 ? 'One answer' : `${refused.length} answers`
  const were = refused.length === 1 ? 'was' : 'were'
  r.lastError.value = new ApiError(
    error.status,
    error.code,
    `${what} could not be saved and ${were} left out: ${error.message}`,
    error.fields,
  )
  r.errorIsRefusal = true
}

function retryLater(r: Recorder, error: ApiError) {
  r.failures += 1
  if (!r.errorIsRefusal) r.lastError.value = error
  const delay = Math.min(RETRY_MAX_MS, RETRY_BASE_MS * 2 ** (r.failures - 1))
  r.retryTimer = setTimeout(
    () => {
      r.retryTimer = undefined
      void flush(r)
    },
    delay + Math.random() * 250,
  )
}

/** Sends one batch; false when sending should stop for now. */
async function sendOne(r: Recorder): Promise<boolean> {
  const batch = r.queue.value.slice(0, MAX_BATCH)
  try {
    await postAttempts(batch, localTimeZone())
    remove(r, batch)
    r.failures = 0
    if (!r.errorIsRefusal) r.lastError.value = null
    return true
  } catch (e) {
    const error = e instanceof ApiError ? e : new ApiError(0, 'unknown', String(e))
    if (isRetryable(error)) retryLater(r, error)
    else if (error.status === 401) {
      if (!r.errorIsRefusal) r.lastError.value = error // the answers wait for the next sign-in
    } else {
      dropRefused(r, batch, error)
      return true
    }
    return false
  }
}

async function drain(r: Recorder) {
  try {
    await r.loading
    r.isSending.value = true
    while (r.queue.value.length && (await sendOne(r)));
  } finally {
    r.isSending.value = false
    r.inFlight = null
  }
}

/**
 * Sends everything queued now (waits for a send already under way); resolves when done or failed,
 * with the stored queue up to date.
 */
async function flush(r: Recorder): Promise<void> {
  clearTimeout(r.flushTimer)
  if (r.retryTimer) {
    clearTimeout(r.retryTimer)
    r.retryTimer = undefined
  }
  await (r.inFlight ??= drain(r))
  await r.writes
}

function clearError(r: Recorder) {
  r.lastError.value = null
  r.errorIsRefusal = false
  r.dropped.value = 0
}

export const useAttemptsStore = defineStore('attempts', () => {
  const auth = useAuthStore()
  const owner = ref<string | null>(auth.user?.id ?? null)
  const r: Recorder = {
    owner,
    queue: ref<AttemptInput[]>([]),
    isSending: ref(false),
    lastError: ref<ApiError | null>(null),
    dropped: ref(0),
    errorIsRefusal: false,
    failures: 0,
    inFlight: null,
    writes: Promise.resolve(),
    loading: Promise.resolve(0),
  }
  startLoading(r, owner.value)

  // Each player has their own queue: another sign-in on this browser never sends someone else's answers.
  watch(
    () => auth.user?.id ?? null,
    (id) => {
      if (id === owner.value) return
      owner.value = id
      r.queue.value = []
      startLoading(r, id)
    },
  )

  flushNow = () => flush(r)

  return {
    ...{ queue: r.queue, isSending: r.isSending, lastError: r.lastError, dropped: r.dropped },
    pending: computed(() => r.queue.value.length),
    record: (attempt: AttemptInput) => record(r, attempt),
    flush: () => flush(r),
    clearError: () => clearError(r),
  }
})
