// Neck Recall in the browser: weak spots asked first with their reason, picked answers graded,
// every answer recorded through the attempts API, and "retry the misses".
import { flushPromises } from '@vue/test-utils'
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { setPitchPlayer } from '../../src/audio'
import { mountRoute, untilShown } from '../helpers/mount'
import { ATTEMPTS_OK, fakePlayer, INSTRUMENT_ANSWERS, NOOR_BASS, stubApi } from './drill-test-kit'

// The A string (A1 = 33), frets 5–6: D2 (38) and Eb2 (39) (arithmetic).
const SETTINGS = {
  region: { lowString: 1, highString: 1, lowFret: 5, highFret: 6 },
  order: 'random',
  answerMode: 'picked',
  spellInKey: false,
  keyTonic: 'C',
  keyScale: 'major',
  focus: true,
  questionCount: 2,
  timeLimitMinutes: null,
}
const FOCUS = {
  instrumentId: NOOR_BASS.id,
  drill: 'recall',
  items: [
    { string: 1, fret: 6, pitch: 39, score: 0.9, due: null, reason: 'missed twice this week' },
  ],
}

beforeEach(() => {
  localStorage.setItem('ambitus.drill.recall', JSON.stringify(SETTINGS))
  setPitchPlayer(fakePlayer().player)
})
afterEach(() => {
  vi.unstubAllGlobals()
  localStorage.clear()
  setPitchPlayer(null)
})

async function startSession() {
  const api = stubApi({
    ...INSTRUMENT_ANSWERS,
    'GET /api/focus': FOCUS,
    'POST /api/attempts': ATTEMPTS_OK,
  })
  const { wrapper } = await mountRoute('/practice/recall', { attachTo: document.body })
  await wrapper.find('[data-testid="start-session"]').trigger('click')
  await flushPromises()
  return { api, wrapper }
}

describe('NeckRecallView', () => {
  it('when focus is on, then the weak spot comes first with its reason, and the region bounds the request', async () => {
    const { api, wrapper } = await startSession()
    const question = wrapper.find('[data-testid="question"]')
    expect(question.attributes('data-string')).toBe('1')
    expect(question.attributes('data-fret')).toBe('6')
    expect(question.text()).toContain('A string, fret 6')
    expect(wrapper.find('[data-testid="focus-reason"]').text()).toContain('missed twice this week')
    const [request] = api.sent('GET', '/api/focus')
    expect(request?.query.get('instrument')).toBe(NOOR_BASS.id)
    expect(request?.query.get('lowFret')).toBe('5')
    expect(request?.query.get('highString')).toBe('1')
    wrapper.unmount()
  })

  it('when one answer is right and one wrong, then the summary shows 50 % and both attempts are sent', async () => {
    const { api, wrapper } = await startSession()
    await wrapper.find('[data-note="Eb"]').trigger('click')
    expect(wrapper.find('[data-testid="feedback-text"]').text()).toBe('Right: E♭/D♯.')
    await wrapper.find('[data-testid="next"]').trigger('click')
    expect(wrapper.find('[data-testid="question"]').attributes('data-fret')).toBe('5')
    await wrapper.find('[data-note="E"]').trigger('click')
    expect(wrapper.find('[data-testid="feedback-text"]').text()).toBe('Not E: this cell is D.')
    await wrapper.find('[data-testid="next"]').trigger('click')
    await flushPromises()

    expect(wrapper.find('[data-testid="summary-accuracy"]').text()).toBe('50 %')
    await vi.waitFor(() => expect(api.sent('POST', '/api/attempts').length).toBeGreaterThan(0))
    const sent = api
      .sent('POST', '/api/attempts')
      .flatMap((r) => (r.body as { attempts: Record<string, unknown>[] }).attempts)
    expect(sent.map((a) => [a.string, a.fret, a.expectedPitch, a.answer, a.correct])).toEqual([
      [1, 6, 39, 'Eb', true],
      [1, 5, 38, 'E', false],
    ])
    expect(sent[0]).toMatchObject({
      drill: 'recall',
      instrumentId: NOOR_BASS.id,
      tuning: NOOR_BASS.tuning,
      detail: { focusReason: 'missed twice this week' },
    })
    expect(new Set(sent.map((a) => a.sessionId)).size).toBe(1)
    wrapper.unmount()
  })

  it('when the misses are retried, then only the missed cell is asked again', async () => {
    const { wrapper } = await startSession()
    await wrapper.find('[data-note="Eb"]').trigger('click')
    await wrapper.find('[data-testid="next"]').trigger('click')
    await wrapper.find('[data-note="E"]').trigger('click')
    await wrapper.find('[data-testid="next"]').trigger('click')
    await flushPromises()
    expect(wrapper.find('[data-testid="retry-misses"]').text()).toContain('(1)')
    await wrapper.find('[data-testid="retry-misses"]').trigger('click')
    await flushPromises()
    expect(wrapper.find('[data-testid="question"]').attributes('data-fret')).toBe('5')
    expect(wrapper.find('[data-testid="question-number"]').text()).toBe('Question 1 of 1')
    wrapper.unmount()
  })

  it('when the focus API fails, then the session still starts in the usual order and says why', async () => {
    stubApi({ ...INSTRUMENT_ANSWERS, 'POST /api/attempts': ATTEMPTS_OK })
    const { wrapper } = await mountRoute('/practice/recall', { attachTo: document.body })
    await wrapper.find('[data-testid="start-session"]').trigger('click')
    await flushPromises()
    expect(wrapper.find('[data-testid="question"]').exists()).toBe(true)
    expect(wrapper.text()).toContain(
      'could not be loaded, so the questions come in the usual order',
    )
    wrapper.unmount()
  })
})

describe('NeckRecallView with a plan item', () => {
  const PLAN_ITEM = {
    id: '11111111-1111-4111-8111-111111111111',
    planId: '22222222-2222-4222-8222-222222222222',
    planTitle: 'Week 3: the first five frets',
    preset: {
      drill: 'recall',
      settings: {
        ...SETTINGS,
        questionCount: 1,
        focus: false,
        region: { lowString: 0, highString: 0, lowFret: 3, highFret: 3 },
      },
    },
    target: { kind: 'sessions', count: 3 },
    dueAt: null,
  }

  it("when opened from a plan, then the plan's settings are used and locked, and attempts carry the item id", async () => {
    const api = stubApi({
      ...INSTRUMENT_ANSWERS,
      [`GET /api/plans/items/${PLAN_ITEM.id}`]: PLAN_ITEM,
      'POST /api/attempts': ATTEMPTS_OK,
    })
    const { wrapper } = await mountRoute(`/practice/recall?planItem=${PLAN_ITEM.id}`, {
      attachTo: document.body,
    })
    const banner = wrapper.find('[data-testid="plan-item-banner"]')
    expect(banner.text()).toContain('Week 3: the first five frets')
    expect(banner.text()).toContain('3 practice sessions')
    await untilShown(wrapper, '[data-testid="focus-switch"]')
    expect(wrapper.find('[data-testid="focus-switch"] input').attributes('disabled')).toBeDefined()

    await wrapper.find('[data-testid="start-session"]').trigger('click')
    await flushPromises()
    // E string fret 3 = G1 (28 + 3 = 31, arithmetic)
    expect(wrapper.find('[data-testid="question"]').attributes('data-pitch')).toBe('31')
    await wrapper.find('[data-note="G"]').trigger('click')
    await wrapper.find('[data-testid="next"]').trigger('click')
    await flushPromises()
    await vi.waitFor(() => expect(api.sent('POST', '/api/attempts').length).toBeGreaterThan(0))
    const [attempt] = (
      api.sent('POST', '/api/attempts')[0]?.body as { attempts: Record<string, unknown>[] }
    ).attempts
    expect(attempt).toMatchObject({ planItemId: PLAN_ITEM.id, correct: true, expectedPitch: 31 })
    wrapper.unmount()
  })

  it('when the plan item is for another drill, then the page says so', async () => {
    stubApi({
      ...INSTRUMENT_ANSWERS,
      [`GET /api/plans/items/${PLAN_ITEM.id}`]: {
        ...PLAN_ITEM,
        preset: { drill: 'hunt', settings: {} },
      },
    })
    const { wrapper } = await mountRoute(`/practice/recall?planItem=${PLAN_ITEM.id}`, {
      attachTo: document.body,
    })
    expect(wrapper.find('[data-testid="plan-item-error"]').text()).toContain(
      'for Pitch Hunt, not Neck Recall',
    )
    wrapper.unmount()
  })
})

describe('NeckRecallView defaults', () => {
  it("when nothing is remembered, then the region covers every string of the player's own instrument", async () => {
    localStorage.clear()
    const guitar = {
      ...NOOR_BASS,
      name: 'Nylon-string guitar',
      tuning: [40, 45, 50, 55, 59, 64],
      frets: 19,
    } // E2 A2 D3 G3 B3 E4
    stubApi({
      'GET /api/instruments': { instruments: [guitar] },
      'GET /api/instruments/presets': { presets: [] },
    })
    const { wrapper } = await mountRoute('/practice/recall', { attachTo: document.body })
    await untilShown(wrapper, '[data-testid="focus-switch"]')
    const setup = wrapper.find('[data-testid="drill-setup"]').text()
    expect(setup).toContain('low E string')
    expect(setup).toContain('high E string')
    expect(wrapper.find('[data-testid="drill-instrument"]').text()).toContain('Nylon-string guitar')
    wrapper.unmount()
  })
})
