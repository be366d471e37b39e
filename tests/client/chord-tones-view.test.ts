// Chord Tones in the browser with a fake pitch player: a session of Dm7 in frets 2–6 (answers from
// the theory core: D2 F2 A2 C3), a wrong pick named as a chord tone, the attempts stored with chord
// type and degree, the next session continuing with G7, a played note answering (Play mode), and
// the figures per chord type and degree from the statistics API.
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { defineComponent, h } from 'vue'
import { setPitchPlayer } from '../../src/audio'
import { useChordTones } from '../../src/drills/chords/useChordTones'
import { chordArpeggio, parsePitch, positionsOf } from '../../src/theory'
import { mountRoute, mountWithApp } from '../helpers/mount'
import { ATTEMPTS_OK, fakePlayer, INSTRUMENT_ANSWERS, NOOR_BASS, stubApi } from './drill-test-kit'

const SETTINGS = { lowFret: 2, highFret: 6, questionCount: 4 }
const FIGURES = {
  instrumentId: NOOR_BASS.id,
  chordTypes: [
    {
      chordType: 'minor seventh',
      attempts: 5,
      correct: 3,
      accuracy: 0.6,
      medianMs: 1100,
      lastSeenAt: null,
    },
  ],
  degrees: [
    { degree: 'b3', attempts: 2, correct: 1, accuracy: 0.5, medianMs: 1500, lastSeenAt: null },
  ],
  cells: [],
}
// Dm7's tones from D2 up inside frets 2–6 (the window D2–C#3 the position spans: tonal spelling)
const DM7 = chordArpeggio('Dm7', { low: parsePitch('D2'), high: parsePitch('C#3') }).map(
  (t) => t.pitch,
)

beforeEach(() => {
  localStorage.setItem('ambitus.drill.chords', JSON.stringify(SETTINGS))
  setPitchPlayer(fakePlayer().player)
})
afterEach(() => {
  vi.unstubAllGlobals()
  vi.useRealTimers()
  localStorage.clear()
  setPitchPlayer(null)
})

const placeIn = (pitch: number) =>
  positionsOf(NOOR_BASS.tuning, NOOR_BASS.frets, pitch).find((p) => p.fret >= 2 && p.fret <= 6)!

async function pick(wrapper: VueWrapper, pitch: number) {
  const place = placeIn(pitch)
  await wrapper.find(`[data-string="${place.string}"][data-fret="${place.fret}"]`).trigger('click')
  await flushPromises()
}

async function next(wrapper: VueWrapper) {
  await wrapper.find('[data-testid="next"]').trigger('click')
  await flushPromises()
}

describe('ChordTonesView', () => {
  it('when a session of Dm7 is played, then each tone is graded and stored with its chord type and degree', async () => {
    expect(DM7).toEqual([38, 41, 45, 48]) // D2 F2 A2 C3 (MIDI arithmetic)
    const api = stubApi({
      ...INSTRUMENT_ANSWERS,
      'POST /api/attempts': ATTEMPTS_OK,
      'GET /api/progress/chords': FIGURES,
    })
    const { wrapper } = await mountRoute('/practice/chords', { attachTo: document.body })
    await flushPromises()
    expect(wrapper.findAll('[data-testid="chord-type-row"]')[0]?.text()).toContain('minor seventh')
    expect(wrapper.findAll('[data-testid="degree-row"]')[0]?.text()).toContain('♭3')

    await wrapper.find('[data-testid="start-session"]').trigger('click')
    await flushPromises()
    expect(wrapper.find('[data-testid="chord-symbol"]').text()).toBe('Dm7')
    expect(wrapper.find('[data-testid="question"]').text()).toContain('start on its lowest 1')
    await pick(wrapper, 38)
    await next(wrapper)
    expect(wrapper.find('[data-testid="question"]').text()).toContain('next up, the ♭3')
    await pick(wrapper, 45) // A2: the 5, not the b3
    expect(wrapper.find('[data-testid="feedback-text"]').text()).toContain(
      'That is A2 (the 5 of Dm7); the ♭3 of Dm7 is F2',
    )
    await next(wrapper)
    await pick(wrapper, 45)
    await next(wrapper)
    await pick(wrapper, 48)
    await next(wrapper)
    expect(wrapper.find('[data-testid="summary-accuracy"]').text()).toBe('75 %')

    await vi.waitFor(() => expect(api.sent('POST', '/api/attempts').length).toBeGreaterThan(0))
    const attempts = api
      .sent('POST', '/api/attempts')
      .flatMap((r) => (r.body as { attempts: Record<string, unknown>[] }).attempts)
    expect(attempts.map((a) => [a.expectedPitch, a.correct])).toEqual([
      [38, true],
      [41, false],
      [45, true],
      [48, true],
    ])
    expect(attempts[1]).toMatchObject({
      drill: 'chords',
      detail: { chord: 'Dm7', chordType: 'minor seventh', degree: 'b3', inversion: 0, key: 'C' },
    })

    await wrapper.find('[data-testid="practise-again"]').trigger('click')
    await flushPromises()
    expect(wrapper.find('[data-testid="chord-symbol"]').text()).toBe('G7') // continues the ii–V–I
    wrapper.unmount()
  }, 60_000) // a whole session through the page: slow when the machine is shared

  it('when a note is played on the instrument (Play mode), then it answers at its exact pitch', async () => {
    vi.useFakeTimers({ toFake: ['performance', 'setTimeout', 'clearTimeout'] })
    stubApi({
      ...INSTRUMENT_ANSWERS,
      'POST /api/attempts': ATTEMPTS_OK,
      'GET /api/progress/chords': FIGURES,
    })
    let drill: ReturnType<typeof useChordTones> | undefined
    mountWithApp(defineComponent({ setup: () => ((drill = useChordTones()), () => h('div')) }))
    await flushPromises()
    await drill!.begin()
    const state = () => drill!.session.state.value!
    expect(drill!.session.current.value?.expectedPitch).toBe(DM7[0]) // D2, the root of Dm7
    drill!.answerPitch(DM7[0]! + 12, { onsetMs: state().shownAt! }) // D3: an octave too high
    expect(state().lastGrade?.correct).toBe(false)
    drill!.session.next()
    vi.advanceTimersByTime(1000) // the note began 700 ms after the question, heard later
    drill!.answerPitch(DM7[1]!, { onsetMs: state().shownAt! + 700 }) // F2, the b3
    expect(state().lastGrade?.correct).toBe(true)
    expect(state().records.at(-1)?.responseMs).toBe(700)
    expect(positionsOf(NOOR_BASS.tuning, NOOR_BASS.frets, DM7[1]!)).toContainEqual(
      state().lastGrade?.cell,
    )
  })
})
