// useSound(): the pitch player with the active instrument's volume, reference pitch, sound on/off
// and voice applied (and kept in step while the component lives).
import { computed, watchEffect } from 'vue'
import { useInstrumentStore } from '../stores/instruments'
import { getPitchPlayer, preloadSound } from './index'

export function useSound() {
  const instruments = useInstrumentStore()
  const player = getPitchPlayer()
  const enabled = computed(() => instruments.active?.soundOn ?? true)

  watchEffect(() => {
    const active = instruments.active
    player.setVolume(active ? (active.soundOn ? active.volume : 0) : 0.6)
    player.setReferenceHz(active?.referenceHz ?? 440)
    if (active) player.setTuning?.(active.tuning)
  })
  preloadSound()

  return {
    player,
    enabled,
    /** Unlocks audio; call from the click or key press that first needs sound. */
    start: () => player.start(),
    play: (pitch: number, options?: Parameters<typeof player.play>[1]) => {
      if (enabled.value) player.play(pitch, options)
    },
    playSequence: (pitches: number[], bpm: number) => {
      if (enabled.value) player.playSequence(pitches, bpm)
    },
    startClick: (bpm: number) => {
      if (enabled.value) player.startClick(bpm)
    },
    stopClick: () => player.stopClick(),
  }
}
