// The input-mode seam every drill has: a note played on the instrument (answerPitch, as the
// microphone will send it) is graded like a pick or a named note, timed from when it began.
import { flushPromises } from '@vue/test-utils'
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { defineComponent, h } from 'vue'
import { setPitchPlayer } from '../../src/audio'
import { usePitchHunt } from '../../src/drills/hunt/usePitchHunt'
import { useNeckRecall } from '../../src/drills/recall/useNeckRecall'
import { positionsOf } from '../../src/theory'
import { mountWithApp } from '../helpers/mount'
import { ATTEMPTS_OK, fakePlayer, INSTRUMENT_ANSWERS, NOOR_BASS, stubApi } from './drill-test-kit'

/** Mounts a drill's composable alone and hands it back (the page is not needed for the seam). */
async function withDrill<T>(use: () => T): Promise<T> {
  let drill: T | undefined
  mountWithApp(defineComponent({ setup: () => ((drill = use()), () => h('div')) }))
  await flushPromises()
  return drill as T
}

beforeEach(() => {
  vi.useFakeTimers({
    toFake: ['performance', 'setInterval', 'clearInterval', 'setTimeout', 'clearTimeout'],
  })
  setPitchPlayer(fakePlayer().player)
  stubApi({ ...INSTRUMENT_ANSWERS, 'POST /api/attempts': ATTEMPTS_OK })
})
afterEach(() => {
  vi.useRealTimers()
  vi.unstubAllGlobals()
  localStorage.clear()
  setPitchPlayer(null)
})

describe('answerPitch (the "play" input mode)', () => {
  it('Pitch Hunt: the played pitch is right at the exact octave, timed from the note onset', async () => {
    localStorage.setItem('ambitus.drill.hunt', JSON.stringify({ focus: false, questionCount: 2 }))
    const hunt = await withDrill(usePitchHunt)
    expect(hunt.inputMode.value).toBe('tap')
    await hunt.begin()
    const state = () => hunt.session.state.value!
    const asked = hunt.session.current.value!.expectedPitch
    vi.advanceTimersByTime(1500)
    // an octave off (E1–G2 + 20 frets reaches 63, arithmetic), timed from the onset, not from now
    const octaveOff = asked + 12 <= 63 ? asked + 12 : asked - 12
    hunt.answerPitch(octaveOff, { onsetMs: state().shownAt! + 1000 })
    expect(state().lastGrade?.correct).toBe(false)
    expect(state().records[0]?.responseMs).toBe(1000)
    hunt.session.next()
    const second = hunt.session.current.value!.expectedPitch
    hunt.answerPitch(second, { onsetMs: state().shownAt! })
    expect(state().lastGrade?.correct).toBe(true)
    // stored at a place that sounds the pitch (the theory core's places of it)
    const places = positionsOf(NOOR_BASS.tuning, NOOR_BASS.frets, second)
    expect(places).toContainEqual(state().lastGrade?.cell)
  })

  it('Neck Recall: the played note must be the cell’s exact pitch (its name an octave up is wrong)', async () => {
    const region = { lowString: 1, highString: 1, lowFret: 5, highFret: 5 } // A string fret 5 = D2
    localStorage.setItem(
      'ambitus.drill.recall',
      JSON.stringify({ region, focus: false, questionCount: 2, answerMode: 'picked' }),
    )
    const recall = await withDrill(useNeckRecall)
    await recall.begin()
    const state = () => recall.session.state.value!
    expect(recall.session.current.value?.expectedPitch).toBe(38) // D2 = 33 + 5 (arithmetic)
    recall.answerPitch(50, { onsetMs: state().shownAt! }) // D3: the same note an octave up
    expect(state().lastGrade?.correct).toBe(false)
    recall.session.next()
    recall.answerPitch(38, { onsetMs: state().shownAt! }) // D2: the cell's own pitch
    expect(state().lastGrade?.correct).toBe(true)
  })

  it('a played note outside a question (before the session) is ignored', async () => {
    const hunt = await withDrill(usePitchHunt)
    hunt.answerPitch(40, { onsetMs: 0 })
    expect(hunt.session.state.value).toBeNull()
  })
})
