// Play-along for an exercise: each note sounds in turn at the tempo while `index` follows it (the
// board and the notation mark that note); stepping by hand moves it without sound.
import { onBeforeUnmount, ref, type Ref } from 'vue'
import { getPitchPlayer } from '../audio'
import type { Exercise } from '../exchange'

export function usePlayAlong(exercise: Ref<Exercise | null>) {
  const player = getPitchPlayer()
  const index = ref<number | null>(null)
  const playing = ref(false)
  const tempo = ref(72)
  const volume = ref(0.6)
  let timer: ReturnType<typeof setTimeout> | null = null

  function stop() {
    if (timer !== null) clearTimeout(timer)
    timer = null
    playing.value = false
  }

  function sound(at: number) {
    const notes = exercise.value?.notes ?? []
    const note = notes[at]
    if (!note || !playing.value) return stop()
    index.value = at
    const beatS = 60 / tempo.value
    player.play(note.pitch, { durationS: note.durationBeats * beatS * 0.9 })
    timer = setTimeout(() => sound(at + 1), note.durationBeats * beatS * 1000)
  }

  /** Starts from the marked note (or the first); call from the click, which unlocks audio. */
  async function play() {
    stop()
    player.setVolume(volume.value)
    player.setTuning?.([...(exercise.value?.tuning ?? [])])
    await player.start()
    playing.value = true
    const notes = exercise.value?.notes.length ?? 0
    sound(index.value !== null && index.value < notes - 1 ? index.value : 0)
  }

  function step(by: 1 | -1) {
    stop()
    const last = (exercise.value?.notes.length ?? 1) - 1
    index.value = Math.min(last, Math.max(0, (index.value ?? -1) + by))
  }

  onBeforeUnmount(stop)
  return { index, playing, tempo, volume, play, stop, step }
}
