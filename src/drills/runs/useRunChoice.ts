// The run a hand position offers and its fingerings: the one practised least is offered first, the
// student may pick another; and why no fingering fits, when none does.
import { computed, ref, watch, type Ref } from 'vue'
import type { RunsSettings } from '../../contract/drills'
import { MAX_SHIFTS, type Fingering } from '../../theory'
import type { DrillNeck } from '../engine/useDrillNeck'
import { fingeringId, rotation, runOverview, type RunOverview } from './runs-generator'
import { useFingeringPractice } from './useFingeringPractice'

// Why no fingering fits, in words (the run is longer than the strings can hold at this many per string).
function noFingeringProblem(
  view: RunOverview | null,
  settings: RunsSettings,
  strings: number,
): string | null {
  if (!view) return null
  if (view.tooMany)
    return `This region offers ${view.total.toLocaleString()} fingerings, too many to list: narrow the frets or allow fewer notes per string.`
  if (view.total > 0) return null
  const room = strings * settings.maxPerString
  if (view.run.length > room) {
    return `The run has ${view.run.length} notes, but ${strings} strings × ${settings.maxPerString} notes per string hold only ${room}: allow more notes per string or narrow the frets.`
  }
  if (settings.shifts < MAX_SHIFTS)
    return 'No fingering stays in this hand position: allow another shift or more notes per string.'
  return 'No fingering fits these settings: allow more notes per string or narrow the frets.'
}

function overviewOf(neck: DrillNeck, settings: RunsSettings) {
  try {
    return { value: runOverview(neck, settings) as RunOverview | null, error: null }
  } catch (error) {
    const message = error instanceof RangeError ? error.message : 'This run cannot be built.'
    return { value: null, error: message }
  }
}

export function useRunChoice(neck: Ref<DrillNeck>, settings: Ref<RunsSettings>) {
  const overview = computed(() => overviewOf(neck.value, settings.value))
  const practice = useFingeringPractice(neck, settings)
  const order = computed<Fingering[]>(() =>
    rotation(overview.value.value?.fingerings ?? [], practice.patterns.value),
  )
  // The student's own pick of fingering; null means the offered one (practised least).
  const pickedId = ref<string | null>(null)
  watch(
    () => {
      const { tonic, scale, lowFret, highFret, maxPerString, shifts, handSystem } = settings.value
      const region = [lowFret, highFret, maxPerString, shifts, handSystem]
      return [neck.value.tuning.join(), tonic, scale, ...region]
    },
    () => (pickedId.value = null),
  )
  const chosen = computed(
    () => order.value.find((f) => fingeringId(f) === pickedId.value) ?? order.value[0] ?? null,
  )
  const chosenId = computed<string | null>({
    get: () => (chosen.value ? fingeringId(chosen.value) : null),
    set: (id) => (pickedId.value = id),
  })
  const problem = computed(
    () =>
      overview.value.error ??
      noFingeringProblem(overview.value.value, settings.value, neck.value.tuning.length),
  )
  return { overview, practice, order, chosen, chosenId, problem }
}
