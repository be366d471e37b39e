// Pitch Hunt in the browser with a fake pitch player: the pitch is played on start and on replay,
// a wrong pick is marked and every right place is shown.
import { flushPromises } from '@vue/test-utils'
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { setPitchPlayer } from '../../src/audio'
import { positionsOf } from '../../src/theory'
import { mountRoute } from '../helpers/mount'
import { ATTEMPTS_OK, fakePlayer, INSTRUMENT_ANSWERS, NOOR_BASS, stubApi } from './drill-test-kit'

// Pitches from frets 0–2 only; one question; the name hidden (heard only).
const SETTINGS = {
  showName: false,
  findAll: false,
  lowFret: 0,
  highFret: 2,
  focus: false,
  questionCount: 1,
  timeLimitMinutes: null,
}
let fake: ReturnType<typeof fakePlayer>

beforeEach(() => {
  localStorage.setItem('ambitus.drill.hunt', JSON.stringify(SETTINGS))
  fake = fakePlayer()
  setPitchPlayer(fake.player)
})
afterEach(() => {
  vi.unstubAllGlobals()
  localStorage.clear()
  setPitchPlayer(null)
})

async function startSession() {
  const api = stubApi({ ...INSTRUMENT_ANSWERS, 'POST /api/attempts': ATTEMPTS_OK })
  const { wrapper } = await mountRoute('/practice/hunt', { attachTo: document.body })
  await wrapper.find('[data-testid="start-session"]').trigger('click')
  await flushPromises()
  const pitch = Number(wrapper.find('[data-testid="question"]').attributes('data-pitch'))
  return { api, wrapper, pitch }
}

describe('PitchHuntView', () => {
  it('when a session starts, then audio is unlocked and the asked pitch is played; replay plays it again', async () => {
    const { wrapper, pitch } = await startSession()
    expect(fake.named('start')).toHaveLength(1)
    expect(fake.named('play').map(([p]) => p)).toEqual([pitch])
    expect(wrapper.find('[data-testid="question"]').text()).toContain('the pitch you hear')
    await wrapper.find('[data-testid="replay"]').trigger('click')
    expect(fake.named('play').map(([p]) => p)).toEqual([pitch, pitch])
    wrapper.unmount()
  })

  it('when the pick is an octave off, then it is marked wrong and every right place is shown', async () => {
    const { wrapper, pitch } = await startSession()
    // the same note an octave up (the asked pitches are at most G2 + 2 = 45, so 57 is on the neck)
    const wrong = positionsOf(NOOR_BASS.tuning, NOOR_BASS.frets, pitch + 12)[0]!
    const wrongCell = `[data-string="${wrong.string}"][data-fret="${wrong.fret}"]`
    await wrapper.find(wrongCell).trigger('click')
    await flushPromises()
    expect(wrapper.find('[data-testid="feedback-text"]').text()).toContain('an octave lower')
    expect(wrapper.find(wrongCell).attributes('data-marks')).toContain('wrong')
    const places = positionsOf(NOOR_BASS.tuning, NOOR_BASS.frets, pitch)
    for (const place of places) {
      expect(
        wrapper
          .find(`[data-string="${place.string}"][data-fret="${place.fret}"]`)
          .attributes('data-marks'),
      ).toContain('hint')
    }
    expect(fake.named('play').at(-1)?.[0]).toBe(pitch + 12) // the picked note is heard
    wrapper.unmount()
  })

  it('when the right place is picked, then the answer counts and the attempt stores the picked cell', async () => {
    const { api, wrapper, pitch } = await startSession()
    const place = positionsOf(NOOR_BASS.tuning, NOOR_BASS.frets, pitch).at(-1)!
    await wrapper
      .find(`[data-string="${place.string}"][data-fret="${place.fret}"]`)
      .trigger('click')
    await wrapper.find('[data-testid="next"]').trigger('click')
    await flushPromises()
    expect(wrapper.find('[data-testid="summary-accuracy"]').text()).toBe('100 %')
    await vi.waitFor(() => expect(api.sent('POST', '/api/attempts').length).toBeGreaterThan(0))
    // The newest answer sent: an earlier test's answer may still wait in the queue and go first.
    const attempt = api
      .sent('POST', '/api/attempts')
      .flatMap((request) => (request.body as { attempts: Record<string, unknown>[] }).attempts)
      .at(-1)
    expect(attempt).toMatchObject({
      drill: 'hunt',
      string: place.string,
      fret: place.fret,
      expectedPitch: pitch,
      correct: true,
      answer: `${place.string}:${place.fret}`,
    })
    wrapper.unmount()
  })
})
