// Sound for a drill: the app's pitch player (useSound) with an unlock that never holds a session up
// (a browser that refuses audio leaves the drill silent, not stuck).
import { computed, ref } from 'vue'
import { useSound } from '../../audio'

const UNLOCK_WAIT_MS = 1500

export function useDrillSound() {
  const sound = useSound()
  const failed = ref(false)

  /** Call from the click that starts a session. */
  async function unlock() {
    if (!sound.enabled.value) return
    const timeout = new Promise<void>((resolve) => setTimeout(resolve, UNLOCK_WAIT_MS))
    try {
      await Promise.race([sound.start(), timeout])
    } catch {
      failed.value = true
    }
  }

  return {
    enabled: sound.enabled,
    failed,
    unlock,
    play: (pitch: number) => sound.play(pitch),
    playSequence: sound.playSequence,
    startClick: sound.startClick,
    stopClick: sound.stopClick,
  }
}

export type DrillSound = ReturnType<typeof useDrillSound>

/** The sound of a drill that plays no notes: nothing is loaded, nothing sounds. */
export function silentSound(): DrillSound {
  const nothing = () => undefined
  return {
    enabled: computed(() => false),
    failed: ref(false),
    unlock: async () => undefined,
    play: nothing,
    playSequence: nothing,
    startClick: nothing,
    stopClick: nothing,
  }
}
