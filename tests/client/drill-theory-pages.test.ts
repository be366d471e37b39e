// Issue 13 on the drill pages: Window Cycle continues where the last session stopped, Range Runs
// plays a hand position with finger numbers, and "show me" in Pitch Hunt is stored as shown.
import { flushPromises } from '@vue/test-utils'
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { setPitchPlayer } from '../../src/audio'
import {
  CycleSettingsSchema,
  HuntSettingsSchema,
  RunsSettingsSchema,
} from '../../src/contract/drills'
import { mountRoute, untilShown } from '../helpers/mount'
import { ATTEMPTS_OK, fakePlayer, INSTRUMENT_ANSWERS, stubApi } from './drill-test-kit'

beforeEach(() => setPitchPlayer(fakePlayer().player))
afterEach(() => {
  vi.unstubAllGlobals()
  localStorage.clear()
  setPitchPlayer(null)
})

const remember = (drill: string, settings: object) =>
  localStorage.setItem(`ambitus.drill.${drill}`, JSON.stringify(settings))
const posted = (api: ReturnType<typeof stubApi>) =>
  api
    .sent('POST', '/api/attempts')
    .flatMap((r) => (r.body as { attempts: Record<string, unknown>[] }).attempts)

describe('Window Cycle continues the cycle', { timeout: 60_000 }, () => {
  // C2–C3 (36–48), major, fourths from C (PRODUCT.md), 8 notes a session
  const SETTINGS = CycleSettingsSchema.parse({ low: 36, high: 48, questionCount: 8 })

  it("when the last session ended on C major's closing root, then the next one starts in F major", async () => {
    remember('cycle', SETTINGS)
    const api = stubApi({
      ...INSTRUMENT_ANSWERS,
      'GET /api/progress/cycle-position': {
        stop: { key: 'C', noteIndex: 7, phase: 'up', at: '2026-12-02T10:00:00.000Z' },
      },
      'POST /api/attempts': ATTEMPTS_OK,
    })
    const { wrapper } = await mountRoute('/practice/cycle', { attachTo: document.body })
    await untilShown(wrapper, '[data-testid="cycle-continues"]')
    expect(wrapper.find('[data-testid="cycle-continues"]').text()).toContain('F major')
    expect(api.sent('GET', '/api/progress/cycle-position')[0]?.query.get('scale')).toBe('major')
    await wrapper.find('[data-testid="start-session"]').trigger('click')
    await flushPromises()
    expect(wrapper.find('[data-testid="question"]').text()).toContain('F major, degree 1')
    // alternate (the default): F major goes down from the F nearest the last note (PRODUCT.md)
    expect(wrapper.find('[data-testid="question"]').text()).not.toContain('the octave')
    wrapper.unmount()
  })

  it('when asked to start at the start key, then the session begins on C again', async () => {
    remember('cycle', SETTINGS)
    stubApi({
      ...INSTRUMENT_ANSWERS,
      'GET /api/progress/cycle-position': { stop: { key: 'C', noteIndex: 7, phase: 'up', at: '' } },
    })
    const { wrapper } = await mountRoute('/practice/cycle', { attachTo: document.body })
    await untilShown(wrapper, '[data-testid="cycle-continues"]')
    await wrapper.find('[data-testid="cycle-continues"] button').trigger('click')
    await wrapper.find('[data-testid="start-session"]').trigger('click')
    await flushPromises()
    expect(wrapper.find('[data-testid="question"]').text()).toContain('C major, degree 1')
    wrapper.unmount()
  })
})

describe('Range Runs in a hand position', { timeout: 60_000 }, () => {
  it('when G major is set to frets 5–8, then position V is named and the board numbers the fingers', async () => {
    remember(
      'runs',
      RunsSettingsSchema.parse({ tonic: 'G', scale: 'major', lowFret: 5, highFret: 8 }),
    )
    stubApi({ ...INSTRUMENT_ANSWERS, 'GET /api/progress/fingerings': { patterns: [] } })
    const { wrapper } = await mountRoute('/practice/runs', { attachTo: document.body })
    await flushPromises()
    expect(wrapper.find('[data-testid="position-name"]').text()).toBe('V') // common practice
    // A1 on the E string at fret 5 is played with the first finger in position V
    expect(wrapper.find('[data-string="0"][data-fret="5"]').attributes('data-marks')).toContain(
      'hint',
    )
    expect(wrapper.find('[data-testid="run-overview"]').text()).toContain('11 notes up')
    await wrapper.find('[data-testid="start-session"]').trigger('click')
    await flushPromises()
    expect(wrapper.find('[data-testid="run-finger"]').text()).toContain('finger 1')
    wrapper.unmount()
  })
})

describe('Pitch Hunt "show me"', { timeout: 60_000 }, () => {
  it('when the player asks to be shown, then the attempt is stored as shown and the summary counts it apart', async () => {
    remember('hunt', HuntSettingsSchema.parse({ questionCount: 1, focus: false, highFret: 2 }))
    const api = stubApi({ ...INSTRUMENT_ANSWERS, 'POST /api/attempts': ATTEMPTS_OK })
    const { wrapper } = await mountRoute('/practice/hunt', { attachTo: document.body })
    await wrapper.find('[data-testid="start-session"]').trigger('click')
    await flushPromises()
    await wrapper.find('[data-testid="reveal"]').trigger('click')
    await wrapper.find('[data-testid="next"]').trigger('click')
    await flushPromises()
    expect(wrapper.find('[data-testid="summary-shown"]').text()).toBe('1')
    expect(wrapper.find('[data-testid="summary-correct"]').text()).toBe('0 of 0')
    await vi.waitFor(() => expect(posted(api).length).toBe(1))
    expect(posted(api)[0]).toMatchObject({ outcome: 'shown', correct: false })
    wrapper.unmount()
  })
})
