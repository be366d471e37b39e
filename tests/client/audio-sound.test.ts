// useSound and the lazy player, with a fake PitchPlayer (Tone.js cannot run in jsdom).
import { flushPromises, mount } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import { afterEach, describe, expect, it, vi } from 'vitest'
import { defineComponent, h, nextTick } from 'vue'
import { getPitchPlayer, setPitchPlayer, useSound } from '../../src/audio'
import { createLazyPlayer } from '../../src/audio/lazy-player'
import { useInstrumentStore } from '../../src/stores/instruments'
import type { Instrument } from '../../src/api/instruments'
import { fakePlayer } from './drill-test-kit'

const BASS: Instrument = {
  id: '00000000-0000-4000-8000-000000000001',
  name: 'Test bass',
  presetId: 'bass-5',
  tuning: [23, 28, 33, 38, 43],
  frets: 24,
  scaleLengthMm: 889,
  handedness: 'right',
  accidentals: 'flat',
  referenceHz: 432,
  soundOn: true,
  volume: 0.35,
  isActive: true,
  createdAt: '2026-12-01T00:00:00.000Z',
}

function withSound() {
  setActivePinia(createPinia())
  const store = useInstrumentStore()
  store.instruments = [BASS]
  let sound!: ReturnType<typeof useSound>
  const wrapper = mount(defineComponent({ setup: () => ((sound = useSound()), () => h('div')) }))
  return { store, wrapper, sound: () => sound }
}

afterEach(() => setPitchPlayer(null))

describe('useSound', () => {
  it('applies the active instrument’s volume, reference pitch and tuning to the player', async () => {
    const fake = fakePlayer()
    setPitchPlayer(fake.player)
    withSound()
    await nextTick()
    expect(fake.last('setVolume')).toEqual([0.35])
    expect(fake.last('setReferenceHz')).toEqual([432])
    expect(fake.last('setTuning')).toEqual([[23, 28, 33, 38, 43]])
  })

  it('follows changes: sound off mutes and play does nothing; a new reference pitch is applied', async () => {
    const fake = fakePlayer()
    setPitchPlayer(fake.player)
    const { store, sound } = withSound()
    store.instruments = [{ ...BASS, soundOn: false, referenceHz: 415 }]
    await nextTick()
    expect(fake.last('setVolume')).toEqual([0])
    expect(fake.last('setReferenceHz')).toEqual([415])
    sound().play(40)
    expect(fake.last('play')).toBeUndefined()
    store.instruments = [{ ...BASS, soundOn: true }]
    await nextTick()
    sound().play(40, { durationS: 0.5 })
    expect(fake.last('play')).toEqual([40, { durationS: 0.5 }])
  })

  it('getPitchPlayer returns the replacement set for tests', () => {
    const fake = fakePlayer()
    setPitchPlayer(fake.player)
    expect(getPitchPlayer()).toBe(fake.player)
  })
})

describe('lazy player', () => {
  it('loads the real player on start and hands it the settings made before', async () => {
    const fake = fakePlayer()
    const load = vi.fn(async () => fake.player)
    const lazy = createLazyPlayer(load)
    lazy.setVolume(0.2)
    lazy.setReferenceHz(442)
    expect(load).not.toHaveBeenCalled()
    expect(lazy.voice).toBe('silent')
    await lazy.start()
    expect(load).toHaveBeenCalledTimes(1)
    expect(fake.calls.slice(0, 3)).toEqual([['setVolume', 0.2], ['setReferenceHz', 442], ['start']])
    lazy.play(45)
    expect(fake.last('play')).toEqual([45, undefined])
    expect(lazy.voice).toBe('synth')
  })

  it('a note asked for before start waits for the player instead of being lost', async () => {
    const fake = fakePlayer()
    const lazy = createLazyPlayer(async () => fake.player)
    lazy.play(33)
    await flushPromises()
    expect(fake.calls.map(([name]) => name)).toEqual([
      'setVolume',
      'setReferenceHz',
      'start',
      'play',
    ])
  })

  it('a player that cannot load leaves the app silent, not broken', async () => {
    const lazy = createLazyPlayer(async () => {
      throw new Error('no audio here')
    })
    lazy.play(33)
    await flushPromises()
    expect(lazy.voice).toBe('silent')
    await expect(lazy.start()).rejects.toThrow('no audio here')
  })
})
