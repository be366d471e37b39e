// A drill played on the instrument: the Tap / Play switch, the microphone listening for the active
// instrument's range (every note heard goes to drill.answerPitch, its onset on the page's clock less
// the measured delay of the input), and the click (Tone.Transport) with its beat grid while a
// session runs. Refused or missing microphones fall back to tapping, with the reason shown.
import { computed, onScopeDispose, ref, watch } from 'vue'
import { useSound } from '@/audio'
import type { DrillPageModel } from '@/drills/engine/useDrill'
import { useListener } from './useListener'

/** Tone.Transport starts its first beat this far ahead of now (Tone's default look-ahead, 0.1 s). */
const CLICK_LEAD_MS = 100
/** Notes heard shown beside the switch, newest last. */
const HEARD_SHOWN = 8

export function useDrillPlay(drill: DrillPageModel) {
  const range = computed(() => {
    const { tuning, frets, referenceHz } = drill.neck.value
    if (tuning.length === 0) return null
    return { lowest: Math.min(...tuning), highest: Math.max(...tuning) + frets, referenceHz }
  })
  const listener = useListener(range)
  const heard = ref<string[]>([])
  const playing = computed(() => drill.inputMode.value === 'play')

  listener.onNote((note) => {
    if (!playing.value) return
    heard.value = [...heard.value, note.name].slice(-HEARD_SHOWN)
    const onAudioClock = listener.session.value?.toPerformanceMs(note.onsetMs) ?? note.onsetMs
    drill.answerPitch(note.pitch, { onsetMs: onAudioClock - (listener.latencyMs.value ?? 0) })
  })

  async function choose(mode: 'tap' | 'play') {
    drill.inputMode.value = mode
    if (mode === 'tap') return void (await listener.stop())
    await listener.start()
    if (listener.status.value !== 'listening') drill.inputMode.value = 'tap'
  }

  const click = useClick(drill, playing)
  onScopeDispose(() => click.stop())
  return { listener, heard, playing, choose, click }
}

/** The click while a session is played: started, restarted at the ladder's new tempo, stopped. */
function useClick(drill: DrillPageModel, playing: { value: boolean }) {
  const sound = useSound()
  const { clock } = drill
  const running = computed(
    () =>
      playing.value &&
      clock.click.value &&
      sound.enabled.value &&
      ['asking', 'feedback'].includes(drill.session.status.value),
  )
  const stop = () => {
    if (clock.grid.value) sound.stopClick()
    clock.grid.value = null
  }
  const start = (bpm: number) => {
    sound.player.setClickVolume?.(clock.clickVolume.value)
    sound.startClick(bpm)
    clock.grid.value = { firstBeatMs: performance.now() + CLICK_LEAD_MS, intervalMs: 60_000 / bpm }
  }
  watch([running, clock.bpm], ([on, bpm]) => (on ? start(bpm) : stop()), { immediate: true })
  watch(clock.clickVolume, (volume) => sound.player.setClickVolume?.(volume))
  return { running, stop }
}
