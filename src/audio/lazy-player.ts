// A PitchPlayer that loads Tone.js on first use: settings are remembered until the real player
// exists, and start() (called from a click or key press) imports Tone and unlocks audio.
import type { PitchPlayer } from './pitch-player'

interface Settings {
  volume: number
  referenceHz: number
  tuning: number[] | null
  clickVolume: number
}

export function createLazyPlayer(
  load: () => Promise<PitchPlayer>,
): PitchPlayer & { preload(): void } {
  const settings: Settings = { volume: 0.6, referenceHz: 440, tuning: null, clickVolume: 1 }
  let real: PitchPlayer | null = null
  let loading: Promise<PitchPlayer> | null = null

  function ensure(): Promise<PitchPlayer> {
    loading ??= load().then((player) => {
      player.setVolume(settings.volume)
      player.setReferenceHz(settings.referenceHz)
      if (settings.tuning) player.setTuning?.(settings.tuning)
      player.setClickVolume?.(settings.clickVolume)
      real = player
      return player
    })
    return loading
  }

  // Before start(), calls wait for the real player; a failed load leaves the app silent, not broken.
  const later = (work: (player: PitchPlayer) => void) => {
    if (real) work(real)
    else
      void ensure()
        .then(async (player) => {
          await player.start()
          work(player)
        })
        .catch(() => undefined)
  }

  return {
    preload: () => void ensure().catch(() => undefined),
    start: async () => (await ensure()).start(),
    play: (pitch, options) => later((player) => player.play(pitch, options)),
    playSequence: (pitches, bpm) => later((player) => player.playSequence(pitches, bpm)),
    startClick: (bpm) => later((player) => player.startClick(bpm)),
    stopClick: () => real?.stopClick(),
    setVolume: (volume) => {
      settings.volume = volume
      real?.setVolume(volume)
    },
    setReferenceHz: (hz) => {
      settings.referenceHz = hz
      real?.setReferenceHz(hz)
    },
    setClickVolume: (volume) => {
      settings.clickVolume = volume
      real?.setClickVolume?.(volume)
    },
    setTuning: (tuning) => {
      settings.tuning = [...tuning]
      real?.setTuning?.(tuning)
    },
    get voice() {
      return real?.voice ?? 'silent'
    },
  }
}
