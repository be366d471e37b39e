// The tuner page and useListener with a stand-in microphone (jsdom has no Web Audio): readings
// light the right string, errors are shown, the calibrations set and remember the noise gate and
// the delay. Open strings E1 A1 D2 G2 = MIDI 28 33 38 43 (common practice); 1 cent = 1/100 of a
// 12-TET semitone.
import { flushPromises, mount } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import { afterEach, beforeEach, describe, expect, it } from 'vitest'
import { defineComponent, h, ref } from 'vue'
import { useListener, type ListenerRange } from '../../src/composables/useListener'
import { setListenInput } from '../../src/listen/browser'
import TunerView from '../../src/views/TunerView.vue'
import { fakeListenInput } from '../helpers/fake-listen-input'
import { mountWithApp } from '../helpers/mount'
import { NOOR_BASS, stubApi } from './drill-test-kit'

let fake: ReturnType<typeof fakeListenInput>
beforeEach(() => {
  localStorage.clear()
  fake = fakeListenInput([
    { deviceId: 'mic-1', label: 'Laptop microphone' },
    { deviceId: 'mic-2', label: 'USB interface' },
  ])
  setListenInput(fake.input)
})
afterEach(() => setListenInput(null))

const reading = (timeMs: number, pitch: number) =>
  ({
    type: 'tuner',
    timeMs,
    pitch,
    frequency: 440 * 2 ** ((pitch - 69) / 12),
    clarity: 0.97,
  }) as const

async function tunerPage() {
  stubApi({
    'GET /api/instruments': { instruments: [NOOR_BASS] },
    'GET /api/instruments/presets': { presets: [] },
  })
  const { wrapper } = mountWithApp(TunerView, { global: { stubs: { RouterLink: true } } })
  await flushPromises()
  const byTest = (id: string) => wrapper.find(`[data-testid="${id}"]`)
  const start = async () => {
    await wrapper
      .findAll('button')
      .find((b) => b.text() === 'Start listening')!
      .trigger('click')
    await flushPromises()
  }
  return { wrapper, byTest, start }
}

describe('the tuner page', () => {
  it('listens for the bass’s open strings and lights the one played, with its cents', async () => {
    const { byTest, start } = await tunerPage()
    expect(byTest('microphone-privacy').text()).toContain('never recorded and never leaves it')
    await start()
    // E1 − 3 semitones to G2 + 5: strings tuned well off still register
    expect(fake.opened[0]).toMatchObject({ lowest: 25, highest: 48, referenceHz: 440, gateDb: -60 })

    ;[10, 40, 70].forEach((t) => fake.emit(reading(t, 33.03))) // A1, 3 cents sharp
    await flushPromises()
    expect(byTest('tuner-target').text()).toBe('A1')
    expect(byTest('tuner-string-1').attributes('aria-current')).toBe('true')
    expect(byTest('tuner-verdict').text()).toBe('In tune')

    ;[100, 130, 160, 190, 220].forEach((t) => fake.emit(reading(t, 32.8))) // 20 cents flat
    await flushPromises()
    expect(byTest('tuner-verdict').text()).toBe('20 cents flat: tune up')

    ;[250, 280, 310, 340, 370].forEach((t) => fake.emit(reading(t, 28.25))) // E1, 25 cents sharp
    await flushPromises()
    expect(byTest('tuner-target').text()).toBe('E1')
    expect(byTest('tuner-string-0').attributes('aria-current')).toBe('true')
    expect(byTest('tuner-string-1').attributes('aria-current')).toBeUndefined()
    expect(byTest('tuner-verdict').text()).toBe('25 cents sharp: tune down')
  })

  it('forgets a reading once the string has stopped (300 ms of the audio clock)', async () => {
    const { byTest, start } = await tunerPage()
    await start()
    fake.emit(reading(10, 38))
    fake.emit({ type: 'level', timeMs: 200, rmsDb: -30, peakDb: -25 })
    await flushPromises()
    expect(byTest('tuner-target').text()).toBe('D2')
    fake.emit({ type: 'level', timeMs: 400, rmsDb: -70, peakDb: -66 })
    await flushPromises()
    expect(byTest('tuner-target').text()).toBe('–')
    expect(byTest('tuner-verdict').text()).toBe('Play an open string')
  })

  it('says so in a browser that cannot listen, and offers no start button to press', async () => {
    setListenInput({ ...fake.input, supported: false })
    const { byTest, wrapper } = await tunerPage()
    expect(byTest('listen-unsupported').text()).toContain('cannot listen')
    const button = wrapper.findAll('button').find((b) => b.text() === 'Start listening')!
    expect(button.attributes('disabled')).toBeDefined()
    expect(fake.opened).toEqual([])
  })

  it('says why when the microphone is blocked, and stays ready to try again', async () => {
    const { wrapper, start } = await tunerPage()
    fake.failNextOpen('denied', 'The microphone is blocked for this site.')
    await start()
    expect(wrapper.find('[role="alert"]').text()).toContain('The microphone is blocked')
    expect(wrapper.text()).toContain('Start listening')
  })
})

function withListener(initial: ListenerRange = { lowest: 28, highest: 67, referenceHz: 440 }) {
  setActivePinia(createPinia())
  const range = ref<ListenerRange | null>(initial)
  let listener!: ReturnType<typeof useListener>
  const wrapper = mount(
    defineComponent({ setup: () => ((listener = useListener(range)), () => h('div')) }),
  )
  return { wrapper, range, listener }
}

const saved = () => JSON.parse(localStorage.getItem('ambitus.listen.v1') ?? '{}')

describe('useListener', () => {
  it('sets the noise gate 6 dB above 2 s of a quiet room, and this browser remembers it', async () => {
    const { listener } = withListener()
    await listener.start()
    const measuring = listener.measureQuietRoom()
    expect(listener.calibrating.value).toBe('quiet-room')
    fake.levels(2000, -58)
    expect(await measuring).toEqual({ gateDb: -52, tooLoud: false })
    expect(fake.gates).toEqual([-52])
    expect(listener.gateDb.value).toBe(-52)
    expect(saved().gateDb).toBe(-52)
    // The next session starts with it.
    const again = withListener()
    await again.listener.start()
    expect(fake.opened.at(-1)?.gateDb).toBe(-52)
  })

  it('measures the delay from clicks heard back, and remembers it', async () => {
    const { listener } = withListener()
    await listener.start()
    const measuring = listener.measureDelay('speakers')
    const clicks = fake.clicks[0]!
    expect(clicks).toHaveLength(8)
    clicks.forEach((click) => fake.emit({ type: 'onset', timeMs: click + 42, levelDb: -20 }))
    fake.levels(1000, -40)
    expect(await measuring).toMatchObject({ latencyMs: 42, matched: 8 })
    expect(listener.latencyMs.value).toBe(42)
    expect(saved().latencyMs).toBe(42)
  })

  it('keeps the old delay when too few clicks were heard', async () => {
    localStorage.setItem('ambitus.listen.v1', JSON.stringify({ latencyMs: 30 }))
    const { listener } = withListener()
    await listener.start()
    const measuring = listener.measureDelay('taps')
    const clicks = fake.clicks[0]!
    clicks
      .slice(0, 3)
      .forEach((click) => fake.emit({ type: 'onset', timeMs: click + 80, levelDb: -20 }))
    fake.levels(7000, -40)
    expect(await measuring).toBeNull()
    expect(listener.latencyMs.value).toBe(30)
  })

  it('passes every note heard to its listeners', async () => {
    const { listener } = withListener()
    await listener.start()
    const heard: string[] = []
    const stop = listener.onNote((note) => heard.push(`${note.name}@${note.onsetMs}`))
    const note = { pitch: 33, name: 'A1', cents: 1, onsetMs: 100, verdictMs: 160 }
    fake.emit({ type: 'note', ...note })
    stop()
    fake.emit({ type: 'note', ...note, onsetMs: 500, verdictMs: 560 })
    expect(heard).toEqual(['A1@100'])
    expect(listener.lastNote.value).toMatchObject({ name: 'A1', onsetMs: 500 })
  })

  it('reopens with another input when one is chosen, and remembers the choice', async () => {
    const { listener } = withListener()
    await listener.start()
    await listener.chooseDevice('mic-2')
    expect(fake.closed()).toBe(1)
    expect(fake.opened.at(-1)?.deviceId).toBe('mic-2')
    expect(listener.deviceLabel.value).toBe('USB interface')
    expect(saved().deviceId).toBe('mic-2')
  })

  it('falls back to the default input when the remembered one is gone, and forgets it', async () => {
    localStorage.setItem('ambitus.listen.v1', JSON.stringify({ deviceId: 'unplugged' }))
    const { listener } = withListener()
    await listener.start()
    expect(fake.opened.map((o) => o.deviceId)).toEqual(['unplugged', null])
    expect(listener.status.value).toBe('listening')
    expect(saved().deviceId).toBeNull()
  })

  it('follows a change of range, and lets the microphone go when the page closes', async () => {
    const { listener, range, wrapper } = withListener()
    await listener.start()
    range.value = { lowest: 23, highest: 67, referenceHz: 442 }
    await flushPromises()
    expect(fake.ranges).toEqual([{ lowest: 23, highest: 67, referenceHz: 442 }])
    wrapper.unmount()
    await flushPromises()
    expect(fake.closed()).toBe(1)
    expect(fake.listening()).toBe(false)
  })
})
