// Progress figures of one student (the signed-in one, or a teacher's student via `student`): summary,
// timeline, places and notes, loaded together for one filter; loaded again while answers still wait
// for the statistics (`pending`).
import { defineStore } from 'pinia'
import { computed, ref, type Ref } from 'vue'
import { ApiError } from '../api/http'
import * as api from '../api/progress'
import type {
  NotesAnswer,
  PositionsAnswer,
  ProgressFilter,
  SummaryAnswer,
  TemposAnswer,
  TimelineAnswer,
} from '../api/progress'
import type { DrillId } from '../contract/drills'

/** Date ranges offered by the filters, in days back from today. */
export const RANGE_CHOICES = [7, 30, 90, 365] as const
export type RangeDays = (typeof RANGE_CHOICES)[number]
/** While answers wait for the statistics, the figures are loaded again after this long. */
export const PENDING_REFRESH_MS = 2000

export interface ProgressSelection {
  studentId?: string
  instrumentId?: string
  drill?: DrillId
  rangeDays: RangeDays
}

/** YYYY-MM-DD of `today` moved back by days (calendar arithmetic in UTC, as the API's days). */
export function daysBefore(today: string, days: number) {
  const d = new Date(`${today}T00:00:00Z`)
  d.setUTCDate(d.getUTCDate() - days)
  return d.toISOString().slice(0, 10)
}

const localToday = () =>
  new Intl.DateTimeFormat('en-CA', { year: 'numeric', month: '2-digit', day: '2-digit' }).format(
    new Date(),
  )

/** Everything the page shows for one filter, in parallel. */
const fetchAll = (f: ProgressFilter) =>
  Promise.all([api.fetchSummary(f), api.fetchTimeline(f), api.fetchPositions(f), api.fetchNotes(f)])

/** The played takes' tempos, beside the rest of a load; a failure stays with them. */
async function loadTempos(
  into: { tempos: Ref<TemposAnswer | null>; temposError: Ref<ApiError | null> },
  f: Parameters<typeof api.fetchTempos>[0],
  current: () => boolean,
) {
  into.temposError.value = null
  try {
    const answer = await api.fetchTempos(f)
    if (current()) into.tempos.value = answer
  } catch (e) {
    if (current())
      into.temposError.value = e instanceof ApiError ? e : new ApiError(0, 'unknown', String(e))
  }
}

export const useProgressStore = defineStore('progress', () => {
  const selection = ref<ProgressSelection>({ rangeDays: 30 })
  const summary = ref<SummaryAnswer | null>(null)
  const timeline = ref<TimelineAnswer | null>(null)
  /** Played takes' fastest clean tempos, loaded beside the rest (their failure is their own). */
  const tempos = ref<TemposAnswer | null>(null)
  const temposError = ref<ApiError | null>(null)
  const positions = ref<PositionsAnswer | null>(null)
  const notes = ref<NotesAnswer | null>(null)
  const isLoading = ref(false)
  const error = ref<ApiError | null>(null)
  let request = 0
  let refresh: ReturnType<typeof setTimeout> | undefined

  /** Answers stored but not yet in the figures (the page says "updating" meanwhile). */
  const pending = computed(() => summary.value?.pending ?? 0)

  /** True once loaded for a student who has never practised (the page shows how to start). */
  const isEmpty = computed(() => summary.value !== null && summary.value.lastPracticeAt === null)

  function filterOf(s: ProgressSelection): ProgressFilter {
    const to = summary.value?.today ?? localToday()
    return {
      student: s.studentId,
      instrument: s.instrumentId,
      drill: s.drill,
      from: daysBefore(to, s.rangeDays - 1),
      to,
    }
  }

  /**
   * Loads everything for a selection; a newer call wins over a slower older one. A quiet load (the
   * refresh while answers wait) shows no loading state, so the filters stay usable under the hand.
   */
  async function load(next: Partial<ProgressSelection> = {}, { quiet = false } = {}) {
    const mine = ++request
    clearTimeout(refresh)
    if ('studentId' in next && next.studentId !== selection.value.studentId) summary.value = null
    selection.value = { ...selection.value, ...next }
    isLoading.value = !quiet
    error.value = null
    try {
      const f = filterOf(selection.value)
      void loadTempos({ tempos, temposError }, f, () => mine === request)
      const [s, t, p, n] = await fetchAll(f)
      if (mine !== request) return
      summary.value = s
      timeline.value = t
      positions.value = p
      notes.value = n
      if (s.pending) refresh = setTimeout(() => void load({}, { quiet: true }), PENDING_REFRESH_MS)
    } catch (e) {
      if (mine === request)
        error.value = e instanceof ApiError ? e : new ApiError(0, 'unknown', String(e))
    } finally {
      if (mine === request) isLoading.value = false
    }
  }

  /** Stops loading again for pending answers (the page is left). */
  const stopRefresh = () => clearTimeout(refresh)

  return {
    ...{ selection, summary, timeline, tempos, temposError, positions, notes },
    ...{ isLoading, error, isEmpty, pending, load, stopRefresh },
  }
})
