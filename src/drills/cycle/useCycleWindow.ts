// The window of a Window Cycle: inside the instrument's range or not, the cycle it plays (or why it
// cannot), widening it a step at a time, its shading on the board, and each key's lowest tone here.
import { computed, ref, type Ref } from 'vue'
import type { CellMark } from '../../components/fretboard/fretboard-types'
import type { CycleSettings } from '../../contract/drills'
import { instrumentRange, widenWindow } from '../../theory'
import type { DrillNeck } from '../engine/useDrillNeck'
import { lowestToneOf, planCycle } from './cycle-generator'

type Direction = 'above' | 'below'

// Every place on the neck whose pitch lies inside the window.
function windowMarks(neck: DrillNeck, { low, high }: CycleSettings): CellMark[] {
  return neck.tuning.flatMap((open, string) =>
    Array.from({ length: neck.frets + 1 }, (_, fret) => ({ string, fret, pitch: open + fret }))
      .filter(({ pitch }) => pitch >= low && pitch <= high)
      .map(({ string, fret }): CellMark => ({ string, fret, kind: 'highlight' })),
  )
}

export function useCycleWindow(settings: Ref<CycleSettings>, neck: Ref<DrillNeck>) {
  const range = computed(() => instrumentRange(neck.value.tuning, neck.value.frets))
  const cycle = computed(() => planCycle(settings.value))
  const outside = computed(
    () => settings.value.low < range.value.low || settings.value.high > range.value.high,
  )
  const problem = computed(() =>
    outside.value
      ? "The window reaches past this instrument's range; choose notes it can play."
      : cycle.value.error,
  )
  const widenStep = ref(2)
  /** Widens the window a step below or above; false at the edge of the instrument's range. */
  function widen(direction: Direction): boolean {
    const { low, high } = settings.value
    const wider = widenWindow({ low, high, direction, range: range.value, step: widenStep.value })
    if (wider) settings.value = { ...settings.value, ...wider }
    return Boolean(wider)
  }
  const canWiden = (direction: Direction) =>
    !outside.value &&
    (direction === 'above'
      ? settings.value.high < range.value.high
      : settings.value.low > range.value.low)
  /** Every key of the cycle with its lowest tone on this instrument (degree 1 unless the key is awkward). */
  const keyTable = computed(() =>
    cycle.value.keys.map((key) => ({
      tonic: key.tonic,
      start: key.names[0] ?? '',
      lowest: lowestToneOf(neck.value, key.tonic, settings.value.scale),
    })),
  )
  const shading = computed(() => windowMarks(neck.value, settings.value))
  return { range, cycle, problem, widenStep, widen, canWiden, keyTable, shading }
}
