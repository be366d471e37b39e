// The progress composite with a stubbed API: empty state for a newcomer, the server's error with a
// retry, and the heat map and note bars from the figures (charts are stubbed: jsdom has no canvas).
import { flushPromises } from '@vue/test-utils'
import { afterEach, describe, expect, it, vi } from 'vitest'
import StudentProgress from '../../src/components/progress/StudentProgress.vue'
import { PENDING_REFRESH_MS } from '../../src/stores/progress'
import { mountWithApp } from '../helpers/mount'

afterEach(() => {
  vi.useRealTimers()
  vi.unstubAllGlobals()
})

const BASS = {
  id: 'i-1',
  name: 'Bass',
  tuning: [28, 33, 38, 43],
  frets: 20,
  scaleLengthMm: 864,
  handedness: 'right',
  accidentals: 'flat',
  isActive: true,
}
const totals = (attempts: number) => ({
  attempts,
  correct: attempts,
  accuracy: attempts ? 1 : null,
  minutes: 0,
  days: 0,
  sessions: 0,
})
const summary = (lastPracticeAt: string | null) => ({
  studentId: 'me',
  timeZone: 'UTC',
  today: '2026-03-10',
  range: { from: null, to: null },
  totals: totals(lastPracticeAt ? 12 : 0),
  todayTotals: totals(0),
  last7Days: totals(0),
  streak: { current: 2, longest: 5, practisedToday: false },
  lastPracticeAt,
  instruments: [BASS],
  activeInstrumentId: 'i-1',
})
const figures = (attempts: number, recentAccuracy: number, medianMs: number) => ({
  attempts,
  correct: attempts,
  accuracy: 1,
  recentAnswers: attempts,
  recentAccuracy,
  medianMs,
  p90Ms: medianMs,
  lastSeenAt: '2026-03-09T10:00:00Z',
})
const BODIES: Record<string, unknown> = {
  summary: summary('2026-03-09T10:00:00Z'),
  timeline: { timeZone: 'UTC', from: '2026-02-09', to: '2026-03-10', series: [] },
  tempos: {
    timeZone: 'UTC',
    from: '2026-02-09',
    to: '2026-03-10',
    series: [
      {
        drill: 'runs',
        settings: 'C major, frets 2–5',
        fastest: 84,
        points: [
          { day: '2026-03-08', bpm: 76 },
          { day: '2026-03-09', bpm: 84 },
        ],
      },
    ],
  },
  positions: {
    instrument: BASS,
    positions: [
      { string: 1, fret: 3, ...figures(6, 0.5, 2100) },
      { string: 0, fret: 5, ...figures(4, 1, 900) },
    ],
  },
  notes: {
    instrument: BASS,
    pitchClasses: Array.from({ length: 12 }, (_, pitchClass) => ({
      pitchClass,
      ...figures(pitchClass === 0 ? 6 : 0, 0.5, 2100),
    })),
    pitches: [],
    byString: [],
  },
}

function stubApi(bodies: Record<string, unknown>, status = 200) {
  const fetch = vi.fn(async (url: string) => {
    const endpoint = /\/api\/progress\/([a-z-]+)/.exec(url)?.[1] ?? ''
    const body =
      status === 200
        ? bodies[endpoint]
        : { error: { code: 'internal', message: 'Something went wrong on our side.' } }
    return new Response(JSON.stringify(body), {
      status,
      headers: { 'content-type': 'application/json' },
    })
  })
  vi.stubGlobal('fetch', fetch)
  return fetch
}

const mountProgress = (props: { studentId?: string } = {}) =>
  mountWithApp(StudentProgress, {
    props,
    global: { stubs: { TimelineChart: true, TempoChart: true } },
  })

describe('StudentProgress', () => {
  it('when a new student has no practice, then it says where to begin with a link to Neck Recall', async () => {
    stubApi({ ...BODIES, summary: summary(null) })
    const { wrapper, router } = mountProgress()
    router.addRoute({
      path: '/practice/recall',
      name: 'practice-recall',
      component: { template: '<div />' },
    })
    await flushPromises()
    expect(wrapper.get('[data-testid="progress-empty"]').text()).toContain('Start with Neck Recall')
    expect(wrapper.find('[data-testid="heat-map"]').exists()).toBe(false)
  })

  it("when a teacher's page passes a student, then every request asks for that student", async () => {
    const fetch = stubApi(BODIES)
    const { wrapper } = mountProgress({ studentId: 'student-7' })
    await flushPromises()
    expect(fetch).toHaveBeenCalledTimes(5) // summary, timeline, places, notes and the tempo ladder
    for (const [url] of fetch.mock.calls) expect(String(url)).toContain('student=student-7')
    // the teacher sees the student's tempo ladder too: its fastest clean take
    expect(wrapper.text()).toContain('Tempo ladder')
  })

  it('when the server fails, then its message and a way to retry are shown', async () => {
    stubApi(BODIES, 500)
    const { wrapper } = mountProgress()
    await flushPromises()
    expect(wrapper.get('[data-testid="progress-error"]').text()).toContain(
      'Something went wrong on our side.',
    )
    expect(wrapper.text()).toContain('Try again')
  })

  it('when there are figures, then each practised place is a heat mark and the weakest place is named', async () => {
    stubApi(BODIES)
    const { wrapper } = mountProgress()
    await flushPromises()
    const marked = wrapper.findAll('[data-testid="heat-map"] [data-marks="highlight"]')
    expect(
      marked.map((c) => `${c.attributes('data-string')}:${c.attributes('data-fret')}`).sort(),
    ).toEqual(['0:5', '1:3'])
    // String 1 of E A D G is the A string; fret 3 there is C2.
    expect(wrapper.get('[data-testid="weakest-places"]').text()).toContain(
      'A string, fret 3 (C2) — 50 % right, median 2.1 s',
    )
    expect(wrapper.get('[data-testid="note-bars"]').text()).toContain('not practised')
    expect(wrapper.get('[data-testid="stat-streak"]').text()).toContain('2 days')
  })

  it('when answers still wait for the statistics, then it says it is updating and loads again until they are counted', async () => {
    vi.useFakeTimers()
    const fetch = stubApi({
      ...BODIES,
      summary: { ...summary('2026-03-09T10:00:00Z'), pending: 3 },
    })
    const { wrapper } = mountProgress()
    await flushPromises()
    expect(wrapper.get('[data-testid="progress-updating"]').text()).toContain(
      'Updating — 3 answers not counted yet',
    )
    expect(fetch).toHaveBeenCalledTimes(5) // summary, timeline, positions, notes, tempos

    stubApi(BODIES) // counted now: no pending field
    await vi.advanceTimersByTimeAsync(PENDING_REFRESH_MS)
    await flushPromises()
    expect(wrapper.find('[data-testid="progress-updating"]').exists()).toBe(false)
    await vi.advanceTimersByTimeAsync(PENDING_REFRESH_MS * 3)
    expect(vi.mocked(globalThis.fetch)).toHaveBeenCalledTimes(5) // no more loads once counted
  })
})

describe('StudentProgress while answers wait', () => {
  it('when the figures load again in the background, then no loading bar shows and the filters stay usable', async () => {
    vi.useFakeTimers()
    stubApi({ ...BODIES, summary: { ...summary('2026-03-09T10:00:00Z'), pending: 3 } })
    const { wrapper } = mountProgress()
    await flushPromises()
    vi.stubGlobal(
      'fetch',
      vi.fn(() => new Promise<Response>(() => {})),
    )
    await vi.advanceTimersByTimeAsync(PENDING_REFRESH_MS)
    expect(vi.mocked(globalThis.fetch)).toHaveBeenCalled() // the refresh is under way
    expect(wrapper.find('[aria-label="Loading progress"]').exists()).toBe(false)
    expect(wrapper.find('[data-testid="progress-filters"] .v-input--disabled').exists()).toBe(false)
  })

  it('when a filter is changed, then the loading bar shows without disabling the filters', async () => {
    stubApi(BODIES)
    const { wrapper } = mountProgress()
    await flushPromises()
    vi.stubGlobal(
      'fetch',
      vi.fn(() => new Promise<Response>(() => {})),
    )
    const filters = wrapper.findComponent({ name: 'ProgressFilters' })
    filters.vm.$emit('change', { drill: 'hunt' })
    await flushPromises()
    expect(wrapper.find('[aria-label="Loading progress"]').exists()).toBe(true)
    expect(wrapper.find('[data-testid="progress-filters"] .v-input--disabled').exists()).toBe(false)
  })
})
