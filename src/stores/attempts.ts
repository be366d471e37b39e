// The attempts recorder: drills call record() for every graded answer; answers wait in a queue kept in
// IndexedDB (per player, attempt-queue.ts) and go to POST /api/attempts in batches — every few
// seconds, at 20 answers, on flush(), when the page is hidden and when the network comes back.
// Network and server errors are retried with exponential back-off; answers the server refuses (400)
// are dropped with a visible error, so one bad answer never blocks the rest. The server ignores ids
// it already has, so re-sending (another tab, a lost reply) is safe.
import { defineStore } from 'pinia'
import { computed, ref, watch } from 'vue'
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

export const useAttemptsStore = defineStore('attempts', () => {
  const auth = useAuthStore()
  const owner = ref<string | null>(auth.user?.id ?? null)
  const queue = ref<AttemptInput[]>([])
  const isSending = ref(false)
  const lastError = ref<ApiError | null>(null)
  /** Answers the server refused and that were dropped (shown with lastError). */
  const dropped = ref(0)
  const pending = computed(() => queue.value.length)
  // A refusal stays on screen until cleared; a transient send error clears itself on success.
  let errorIsRefusal = false
  let flushTimer: ReturnType<typeof setTimeout> | undefined
  let retryTimer: ReturnType<typeof setTimeout> | undefined
  let failures = 0
  let inFlight: Promise<void> | null = null
  // IndexedDB writes run one after another, in the order the queue changed.
  let writes: Promise<void> = Promise.resolve()
  let loading: Promise<number> = startLoading(owner.value)

  function store(work: () => Promise<void>) {
    // Blocked or full storage: the answers stay in memory and are still sent.
    writes = writes.then(work).catch(() => undefined)
  }

  /** Loads a player's queue; answers left from an earlier visit (e.g. offline) go out at once. */
  function startLoading(userId: string | null) {
    const loaded = load(userId)
    void loaded.then((earlier) => {
      if (earlier && userId) void flush()
    })
    return loaded
  }

  /** Loads a player's stored queue into memory; resolves to how many came from an earlier visit. */
  async function load(userId: string | null) {
    const stored = await loadAttempts(queueOwner(userId)).catch(() => [])
    if (userId !== owner.value) return 0
    const recordedNow = new Set(queue.value.map((a) => a.id))
    queue.value = merged(stored, queue.value)
    return stored.filter((a) => !recordedNow.has(a.id)).length
  }

  function schedule(delayMs: number) {
    clearTimeout(flushTimer)
    flushTimer = setTimeout(() => void flush(), delayMs)
  }

  /** Queues one graded answer (the caller sets id with crypto.randomUUID() and createdAt). */
  function record(attempt: AttemptInput) {
    queue.value = [...queue.value, attempt]
    const who = queueOwner(owner.value)
    store(() => saveAttempts(who, [attempt]))
    if (retryTimer || inFlight) return // the back-off or the send under way will take it
    if (queue.value.length >= BATCH_SIZE) void flush()
    else schedule(FLUSH_DELAY_MS)
  }

  function remove(sent: AttemptInput[]) {
    const ids = new Set(sent.map((a) => a.id))
    queue.value = queue.value.filter((a) => !ids.has(a.id))
    store(() => removeAttempts([...ids]))
  }

  function dropRefused(batch: AttemptInput[], error: ApiError) {
    const named = refusedIndices(error)
    const refused = named.size ? batch.filter((_, i) => named.has(i)) : batch
    remove(refused)
    dropped.value += refused.length
    const what = refused.length === 1 ? 'One answer' : `${refused.length} answers`
    const were = refused.length === 1 ? 'was' : 'were'
    lastError.value = new ApiError(
      error.status,
      error.code,
      `${what} could not be saved and ${were} left out: ${error.message}`,
      error.fields,
    )
    errorIsRefusal = true
  }

  function retryLater(error: ApiError) {
    failures += 1
    if (!errorIsRefusal) lastError.value = error
    const delay = Math.min(RETRY_MAX_MS, RETRY_BASE_MS * 2 ** (failures - 1))
    retryTimer = setTimeout(
      () => {
        retryTimer = undefined
        void flush()
      },
      delay + Math.random() * 250,
    )
  }

  /** Sends one batch; false when sending should stop for now. */
  async function sendOne(): Promise<boolean> {
    const batch = queue.value.slice(0, MAX_BATCH)
    try {
      await postAttempts(batch, localTimeZone())
      remove(batch)
      failures = 0
      if (!errorIsRefusal) lastError.value = null
      return true
    } catch (e) {
      const error = e instanceof ApiError ? e : new ApiError(0, 'unknown', String(e))
      if (isRetryable(error)) retryLater(error)
      else if (error.status === 401) {
        if (!errorIsRefusal) lastError.value = error // the answers wait for the next sign-in
      } else {
        dropRefused(batch, error)
        return true
      }
      return false
    }
  }

  async function drain() {
    try {
      await loading
      isSending.value = true
      while (queue.value.length && (await sendOne()));
    } finally {
      isSending.value = false
      inFlight = null
    }
  }

  /**
   * Sends everything queued now (waits for a send already under way); resolves when done or failed,
   * with the stored queue up to date.
   */
  async function flush(): Promise<void> {
    clearTimeout(flushTimer)
    if (retryTimer) {
      clearTimeout(retryTimer)
      retryTimer = undefined
    }
    await (inFlight ??= drain())
    await writes
  }

  function clearError() {
    lastError.value = null
    errorIsRefusal = false
    dropped.value = 0
  }

  // Each player has their own queue: another sign-in on this browser never sends someone else's answers.
  watch(
    () => auth.user?.id ?? null,
    (id) => {
      if (id === owner.value) return
      owner.value = id
      queue.value = []
      loading = startLoading(id)
    },
  )

  flushNow = flush

  return { queue, pending, isSending, lastError, dropped, record, flush, clearError }
})
