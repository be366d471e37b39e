// How often each fingering of a run was practised (GET /api/progress/fingerings), so the rotation
// can offer the one practised least. Without it (no history, or a failure) the list keeps its order.
import { ref, watch, type Ref } from 'vue'
import { fetchFingerings } from '../../api/progress'
import type { RunsSettings } from '../../contract/drills'
import type { DrillNeck } from '../engine/useDrillNeck'
import type { PatternPractice } from './runs-generator'

export function useFingeringPractice(neck: Ref<DrillNeck>, settings: Ref<RunsSettings>) {
  const patterns = ref<PatternPractice[]>([])
  const unavailable = ref(false)

  async function load() {
    const instrument = neck.value.instrumentId
    const { tonic, scale, lowFret, highFret } = settings.value
    patterns.value = []
    unavailable.value = false
    if (!instrument) return
    try {
      const answer = await fetchFingerings({ instrument, tonic, scale, lowFret, highFret })
      patterns.value = answer.patterns.map(({ pattern, sessions, lastPractisedAt }) => ({
        pattern,
        sessions,
        lastPractisedAt,
      }))
    } catch {
      unavailable.value = true
    }
  }

  watch(
    () => [
      neck.value.instrumentId,
      settings.value.tonic,
      settings.value.scale,
      settings.value.lowFret,
      settings.value.highFret,
    ],
    () => void load(),
    { immediate: true },
  )
  return { patterns, unavailable }
}
