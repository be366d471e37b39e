// The shared exercise page without an account: the exercise made again from the link's settings,
// the play-along stepping note by note at the tempo, and a withdrawn link explained.
import { flushPromises } from '@vue/test-utils'
import { afterEach, describe, expect, it, vi } from 'vitest'
import { setPitchPlayer } from '../../src/audio'
import { octaveScatter, instrumentRange } from '../../src/theory'
import { mountRoute } from '../helpers/mount'
import { fakePlayer, stubApi } from './drill-test-kit'

afterEach(() => {
  vi.unstubAllGlobals()
  vi.useRealTimers()
  setPitchPlayer(null)
})

const TOKEN = 'Ab3_xYz-0123456789abcd'
// common practice: a 4-string bass is tuned E1 A1 D2 G2 = MIDI 28 33 38 43 (MIDI 1.0 numbering)
const BASS = { name: 'Cedar Hollow loaner', tuning: [28, 33, 38, 43], frets: 20 }
const SHARE = {
  token: TOKEN,
  preset: {
    drill: 'scatter',
    settings: {
      tonic: 'D',
      scale: 'major',
      seed: 99,
      questionCount: null,
      timeLimitMinutes: null,
      low: null,
      high: null,
      minDisplaced: 2,
      maxLeap: null,
    },
  },
  fingering: null,
  title: 'D major octave scatter, seed 99',
  instrument: BASS,
  sharedBy: 'Rowan Teacher',
  createdAt: '2026-12-03T04:00:00.000Z',
}

describe('SharedExerciseView', () => {
  it('when a visitor opens a link, then the same scatter is shown and the play-along sounds it note by note at the tempo', async () => {
    const { player, named } = fakePlayer()
    setPitchPlayer(player)
    stubApi({ [`GET /api/shares/${TOKEN}`]: { share: SHARE } })
    const { wrapper } = await mountRoute(`/shared/${TOKEN}`)
    await flushPromises()
    expect(wrapper.get('[data-testid="shared-title"]').text()).toBe(SHARE.title)
    expect(wrapper.text()).toContain('shared by Rowan Teacher')
    expect(wrapper.find('[data-testid="practise-shared"]').exists()).toBe(false) // not signed in

    const range = instrumentRange(BASS.tuning, BASS.frets)
    const scatter = octaveScatter({
      ...range,
      tonic: 'D',
      scale: 'major',
      minDisplaced: 2,
      seed: 99,
    })
    vi.useFakeTimers()
    await wrapper.get('[data-testid="play-along"]').trigger('click')
    await flushPromises()
    expect(named('play').map(([pitch]) => pitch)).toEqual([scatter.pitches[0]])
    // 72 quarter notes a minute: one note every 60/72 s
    await vi.advanceTimersByTimeAsync((60_000 / 72) * 2)
    expect(named('play').map(([pitch]) => pitch)).toEqual(scatter.pitches.slice(0, 3))
    expect(wrapper.get('[data-testid="along-note"]').text()).toContain(
      `Note 3 of ${scatter.pitches.length}`,
    )
    await vi.advanceTimersByTimeAsync(60_000)
    expect(named('play').map(([pitch]) => pitch)).toEqual(scatter.pitches)
    expect(wrapper.get('[data-testid="play-along"]').text()).toBe('Play along')
    wrapper.unmount()
  })

  it('when the link was revoked, then the page says it was withdrawn and shows no exercise', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(
        async () =>
          new Response(
            JSON.stringify({
              error: {
                code: 'gone',
                message: 'Whoever shared this exercise has withdrawn the link.',
              },
            }),
            { status: 410, headers: { 'content-type': 'application/json' } },
          ),
      ),
    )
    const { wrapper } = await mountRoute(`/shared/${TOKEN}`)
    await flushPromises()
    expect(wrapper.get('[data-testid="shared-missing"]').text()).toMatch(/withdrawn/)
    expect(wrapper.find('[data-testid="shared-title"]').exists()).toBe(false)
    wrapper.unmount()
  })
})
