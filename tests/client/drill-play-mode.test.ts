// Every drill in the "play" input mode with a stand-in microphone (tests/helpers/fake-listen-input):
// the Tap / Play switch opens the microphone, notes heard are graded as each drill's rules say
// (exact pitch, the octave named when only it is wrong, whole takes lined up note by note, pitch
// class inside the window, the free octave variant), the click's beat and the tempo ladder, and a
// refused microphone falls back to tapping. Pitches are MIDI numbers (E1 = 28, common practice).
import { flushPromises } from '@vue/test-utils'
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { defineComponent, h, type Component } from 'vue'
import { setPitchPlayer } from '../../src/audio'
import DrillPage from '../../src/components/drills/DrillPage.vue'
import { useWindowCycle } from '../../src/drills/cycle/useWindowCycle'
import { TAKE_SILENCE_MS } from '../../src/drills/engine/usePlayTake'
import type { DrillQuestion } from '../../src/drills/engine/types'
import type { DrillPageModel } from '../../src/drills/engine/useDrill'
import { usePitchHunt } from '../../src/drills/hunt/usePitchHunt'
import { useNeckRecall } from '../../src/drills/recall/useNeckRecall'
import { passOf } from '../../src/drills/runs/run-marks'
import { useRangeRuns } from '../../src/drills/runs/useRangeRuns'
import { useOctaveScatter } from '../../src/drills/scatter/useOctaveScatter'
import { setListenInput } from '../../src/listen/browser'
import { pitchName } from '../../src/theory'
import { fakeListenInput } from '../helpers/fake-listen-input'
import { mountWithApp } from '../helpers/mount'
import { ATTEMPTS_OK, fakePlayer, INSTRUMENT_ANSWERS, stubApi } from './drill-test-kit'

let mic: ReturnType<typeof fakeListenInput>
let sound: ReturnType<typeof fakePlayer>

beforeEach(() => {
  vi.useFakeTimers({
    toFake: ['performance', 'setInterval', 'clearInterval', 'setTimeout', 'clearTimeout'],
  })
  mic = fakeListenInput()
  setListenInput(mic.input)
  sound = fakePlayer()
  setPitchPlayer(sound.player)
  stubApi({ ...INSTRUMENT_ANSWERS, 'POST /api/attempts': ATTEMPTS_OK })
})
afterEach(() => {
  vi.useRealTimers()
  vi.unstubAllGlobals()
  localStorage.clear()
  setListenInput(null)
  setPitchPlayer(null)
})

/** A drill's page (DrillPage with its default board) in Play mode, its composable at hand. */
async function inPlayMode<T extends DrillPageModel>(use: () => T, settings?: [string, unknown]) {
  if (settings) localStorage.setItem(`ambitus.drill.${settings[0]}`, JSON.stringify(settings[1]))
  let drill: T | undefined
  const page = defineComponent({
    setup: () => ((drill = use()), () => h(DrillPage as unknown as Component, { drill })),
  })
  const { wrapper } = mountWithApp(page, { attachTo: document.body })
  await flushPromises()
  await wrapper.find('[data-testid="input-play"]').trigger('click')
  await flushPromises()
  return { wrapper, drill: drill as T }
}

/** A note heard `afterMs` from now: its onset 60 ms before the detector's verdict. */
function playNote(pitch: number, afterMs = 400) {
  vi.advanceTimersByTime(afterMs)
  const now = performance.now()
  mic.emit({
    type: 'note',
    pitch,
    name: pitchName(pitch),
    cents: 0,
    onsetMs: now - 60,
    verdictMs: now,
  })
}

const questionsOf = <Q extends DrillQuestion>(drill: DrillPageModel<Q>): readonly Q[] =>
  drill.session.state.value?.questions ?? []
const kinds = (wrapper: ReturnType<typeof mountWithApp>['wrapper']) =>
  wrapper.findAll('[data-testid="take-notes"] li').map((li) => li.attributes('data-kind'))
const feedback = (wrapper: ReturnType<typeof mountWithApp>['wrapper']) =>
  wrapper.find('[data-testid="feedback-text"]').text()

describe('the Tap / Play switch', () => {
  it('Play opens the microphone (the privacy note shown where it is asked); Tap closes it', async () => {
    const { wrapper, drill } = await inPlayMode(usePitchHunt)
    expect(mic.opened).toHaveLength(1)
    // the instrument's range: E1 (28) to G2 (43) + 20 frets = 63 (arithmetic)
    expect(mic.opened[0]).toMatchObject({ lowest: 28, highest: 63 })
    expect(drill.inputMode.value).toBe('play')
    expect(wrapper.find('[data-testid="play-listening"]').text()).toContain('USB interface')
    await wrapper.find('[data-testid="input-tap"]').trigger('click')
    await flushPromises()
    expect(drill.inputMode.value).toBe('tap')
    expect(mic.closed()).toBe(1)
    expect(wrapper.find('[data-testid="microphone-privacy"]').exists()).toBe(true)
    wrapper.unmount()
  })

  it('a refused microphone says why and leaves the drill on tapping', async () => {
    mic.failNextOpen('denied', 'The microphone was not allowed.')
    const { wrapper, drill } = await inPlayMode(usePitchHunt)
    expect(drill.inputMode.value).toBe('tap')
    expect(wrapper.find('[data-testid="play-error"]').text()).toContain('by tapping')
    wrapper.unmount()
  })

  it('the set-up dialog holds the tuner and the microphone set-up', async () => {
    const { wrapper } = await inPlayMode(usePitchHunt)
    await wrapper.find('[data-testid="play-setup-open"]').trigger('click')
    // The dialog is an async component: wait for its chunk.
    await vi.waitFor(() =>
      expect(document.querySelector('[data-testid="tuner-panel"]')).not.toBeNull(),
    )
    expect(document.querySelector('[data-testid="microphone-setup"]')).not.toBeNull()
    wrapper.unmount()
  })
})

describe('one note per question', () => {
  const HUNT = { showName: true, findAll: false, lowFret: 0, highFret: 2, focus: false }
  it('Pitch Hunt: the exact octave is right; only the octave wrong is said so', async () => {
    const { wrapper, drill } = await inPlayMode(usePitchHunt, [
      'hunt',
      { ...HUNT, questionCount: 2 },
    ])
    await drill.begin()
    const asked = drill.session.current.value!.expectedPitch
    playNote(asked + 12)
    await flushPromises()
    expect(drill.session.state.value?.lastGrade?.correct).toBe(false)
    expect(feedback(wrapper)).toContain('an octave lower')
    drill.session.next()
    playNote(drill.session.current.value!.expectedPitch)
    await flushPromises()
    expect(drill.session.state.value?.lastGrade?.correct).toBe(true)
    expect(drill.session.state.value?.records[1]?.grade.detail).toMatchObject({ played: true })
    wrapper.unmount()
  })

  it('Neck Recall: the marked cell’s exact pitch is right, the same name an octave up is not', async () => {
    const region = { lowString: 1, highString: 1, lowFret: 5, highFret: 5 } // A string fret 5 = D2
    const recall = { region, focus: false, questionCount: 2, answerMode: 'picked' }
    const { wrapper, drill } = await inPlayMode(useNeckRecall, ['recall', recall])
    await drill.begin()
    expect(drill.session.current.value?.expectedPitch).toBe(38) // D2 = 33 + 5
    playNote(50) // D3
    await flushPromises()
    expect(drill.session.state.value?.lastGrade?.correct).toBe(false)
    expect(feedback(wrapper)).toContain('wrong octave')
    drill.session.next()
    playNote(38)
    await flushPromises()
    expect(drill.session.state.value?.lastGrade?.correct).toBe(true)
    wrapper.unmount()
  })
})

describe('whole takes', () => {
  it('Range Runs: a run played as shown is right note by note; one wrong note is exactly that note', async () => {
    const { wrapper, drill } = await inPlayMode(useRangeRuns)
    await drill.begin()
    const questions = questionsOf(drill)
    const first = questions.filter((q) => passOf(q) === passOf(questions[0]!))
    const run = first.map((q) => q.expectedPitch)
    run.forEach((pitch) => playNote(pitch))
    await flushPromises()
    expect(kinds(wrapper)).toEqual(run.map(() => 'right'))
    expect(wrapper.find('[data-testid="take-summary"]').text()).toContain(
      `${run.length} of ${run.length}`,
    )
    // the second pass (the next fingering, or the same run again) with its third note a semitone off
    const second = questionsOf(drill)
      .slice(first.length, first.length * 2)
      .map((q) => q.expectedPitch)
    second.forEach((pitch, k) => playNote(k === 2 ? pitch + 1 : pitch))
    await flushPromises()
    expect(kinds(wrapper)).toEqual(second.map((_, k) => (k === 2 ? 'wrong' : 'right')))
    const records = drill.session.state.value!.records
    expect(records.map((r) => r.grade.correct)).toEqual([
      ...run.map(() => true),
      ...second.map((_, k) => k !== 2),
    ])
    // timed from one note's onset to the next (400 ms apart), not from when the take was graded
    expect(records[1]?.responseMs).toBe(400)
    wrapper.unmount()
  })

  it('Range Runs: a note left out is missing and an added one extra, once the player stops', async () => {
    const { wrapper, drill } = await inPlayMode(useRangeRuns)
    await drill.begin()
    const questions = questionsOf(drill)
    const run = questions
      .filter((q) => passOf(q) === passOf(questions[0]!))
      .map((q) => q.expectedPitch)
    const played = [run[0]!, run[0]! + 1, ...run.slice(1, 3), ...run.slice(4)] // extra, then one missing
    played.forEach((pitch) => playNote(pitch))
    vi.advanceTimersByTime(TAKE_SILENCE_MS)
    await flushPromises()
    const expected = [
      'right',
      'extra',
      'right',
      'right',
      'missing',
      ...run.slice(4).map(() => 'right'),
    ]
    expect(kinds(wrapper)).toEqual(expected)
    wrapper.unmount()
  })

  it('Octave Scatter: the sequence at its octaves; the free variant wants another octave each note', async () => {
    const settings = { tonic: 'C', scale: 'major', questionCount: 16 }
    const { wrapper, drill } = await inPlayMode(useOctaveScatter, ['scatter', settings])
    await drill.begin()
    const sequence = questionsOf(drill)
      .filter((q) => q.sequence === 0)
      .map((q) => q.expectedPitch)
    sequence.forEach((pitch) => playNote(pitch))
    await flushPromises()
    expect(kinds(wrapper)).toEqual(sequence.map(() => 'right'))
    // free: each pitch class in C2–B2 (36–47) and C3–B3 (48–59) by turns; the last stays in
    // the octave of the note before it (octaves change at C: scientific pitch notation)
    drill.freeOctaves.value = true
    const classes = questionsOf(drill)
      .filter((q) => q.sequence === 1)
      .map((q) => q.expectedPitch % 12)
    const free = classes.map((pc, k) => (k % 2 === 0 ? 36 : 48) + pc)
    free[free.length - 1] = free[free.length - 2]! - (free[free.length - 2]! % 12) + classes.at(-1)!
    free.forEach((pitch) => playNote(pitch))
    vi.advanceTimersByTime(TAKE_SILENCE_MS) // its last note is wrong: the pause ends the take
    await flushPromises()
    expect(kinds(wrapper)).toEqual(
      classes.map((_, k) => (k === classes.length - 1 ? 'wrong' : 'right')),
    )
    wrapper.unmount()
  })

  it('Window Cycle: each key’s pitch classes in order inside the window; outside it is wrong', async () => {
    const { wrapper, drill } = await inPlayMode(useWindowCycle)
    await drill.begin()
    const key = questionsOf(drill)
      .filter((q) => q.keyIndex === 0)
      .map((q) => q.expectedPitch)
    const { high } = drill.settings.value
    // the second note in its pitch class but above the window's top
    const above = (pitch: number) => pitch + 12 * Math.ceil((high + 1 - pitch) / 12)
    key.forEach((pitch, k) => playNote(k === 1 ? above(pitch) : pitch))
    await flushPromises()
    expect(kinds(wrapper)).toEqual(key.map((_, k) => (k === 1 ? 'wrong' : 'right')))
    expect(drill.session.state.value?.records[1]?.grade.feedback).toContain('outside the window')
    wrapper.unmount()
  })
})

describe('time: the click, the beat and the tempo ladder', () => {
  /** A note whose onset is at `onsetMs` (performance.now() time), heard 60 ms later. */
  function playAt(pitch: number, onsetMs: number) {
    vi.advanceTimersByTime(onsetMs + 60 - performance.now())
    mic.emit({
      type: 'note',
      pitch,
      name: pitchName(pitch),
      cents: 0,
      onsetMs,
      verdictMs: onsetMs + 60,
    })
  }

  it('a take on the beat is clean: stored with its tempo, and the ladder climbs; a sloppy one falls back', async () => {
    const { wrapper, drill } = await inPlayMode(useRangeRuns)
    await drill.begin()
    await flushPromises()
    const grid = drill.clock.grid.value!
    expect(sound.named('startClick')).toEqual([[72]]) // the default tempo
    expect(grid.intervalMs).toBeCloseTo(60_000 / 72)
    const questions = questionsOf(drill)
    const run = questions
      .filter((q) => passOf(q) === passOf(questions[0]!))
      .map((q) => q.expectedPitch)
    run.forEach((pitch, k) => playAt(pitch, grid.firstBeatMs + (k + 1) * grid.intervalMs))
    await flushPromises()
    expect(drill.clock.bpm.value).toBe(76)
    // the click's controls load apart from the page (once Play is chosen)
    await import('../../src/components/drills/play/ClickControls.vue')
    await flushPromises()
    expect(drill.session.state.value?.records[0]?.grade.detail).toMatchObject({
      played: true,
      tempo: 72,
      beatMs: 0,
      cleanTempo: 72,
    })
    expect(wrapper.find('[data-testid="fastest-clean"]').text()).toContain('72 BPM')
    expect(sound.named('startClick').at(-1)).toEqual([76]) // the click follows the ladder
    // the next take 150 ms late on every note (tolerance 60 ms): not clean, back down a step
    const next = drill.clock.grid.value!
    const second = questionsOf(drill)
      .slice(run.length, run.length * 2)
      .map((q) => q.expectedPitch)
    second.forEach((pitch, k) => playAt(pitch, next.firstBeatMs + (k + 1) * next.intervalMs + 150))
    await flushPromises()
    expect(drill.clock.bpm.value).toBe(72)
    expect(wrapper.find('[data-testid="take-timing"]').text()).toContain('150 ms late')
    expect(drill.session.state.value?.records[run.length]?.grade.detail).not.toHaveProperty(
      'cleanTempo',
    )
    wrapper.unmount()
  })
})
