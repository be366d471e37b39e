// A gentle nudge to rest after a long stretch of continuous practice. Drills call markActivity()
// on every answer; a pause of a few minutes counts as a break and starts the count again.
// The state is shared by every drill view and kept for the browser tab (sessionStorage).
import { computed, getCurrentInstance, onBeforeUnmount, ref } from 'vue'

export const BREAK_AFTER_MINUTES = 25
/** No answer for this long means the player already took a break. */
export const IDLE_RESET_MINUTES = 5
const STORAGE_KEY = 'ambitus.practiceStretch'
const MINUTE = 60_000

interface Stretch {
  startedAt: number
  lastActivityAt: number
}

function readStretch(): Stretch | null {
  try {
    const stored = JSON.parse(sessionStorage.getItem(STORAGE_KEY) ?? 'null') as Stretch | null
    return stored && Number.isFinite(stored.startedAt) && Number.isFinite(stored.lastActivityAt)
      ? stored
      : null
  } catch {
    return null
  }
}

const stretch = ref<Stretch | null>(typeof sessionStorage === 'undefined' ? null : readStretch())
const now = ref(Date.now())

function save(next: Stretch | null) {
  stretch.value = next
  if (typeof sessionStorage === 'undefined') return
  if (next) sessionStorage.setItem(STORAGE_KEY, JSON.stringify(next))
  else sessionStorage.removeItem(STORAGE_KEY)
}

export function useBreakReminder(options: { afterMinutes?: number; clock?: () => number } = {}) {
  const clock = options.clock ?? Date.now
  const afterMs = (options.afterMinutes ?? BREAK_AFTER_MINUTES) * MINUTE
  if (getCurrentInstance()) {
    const timer = setInterval(() => (now.value = clock()), 30_000)
    onBeforeUnmount(() => clearInterval(timer))
  }

  /** Call on every answer: extends the stretch, or starts a new one after an idle pause. */
  function markActivity() {
    const at = clock()
    now.value = at
    const current = stretch.value
    const rested = !current || at - current.lastActivityAt >= IDLE_RESET_MINUTES * MINUTE
    save({ startedAt: rested ? at : current.startedAt, lastActivityAt: at })
  }

  /** Minutes of continuous practice so far (0 when resting). */
  const minutes = computed(() => {
    const current = stretch.value
    if (!current || now.value - current.lastActivityAt >= IDLE_RESET_MINUTES * MINUTE) return 0
    return Math.floor((current.lastActivityAt - current.startedAt) / MINUTE)
  })
  const due = computed(() => minutes.value * MINUTE >= afterMs)

  /** "Got it": the count starts again, so the next reminder comes after another full stretch. */
  function dismiss() {
    const at = clock()
    save({ startedAt: at, lastActivityAt: at })
  }

  return { due, minutes, markActivity, dismiss }
}
