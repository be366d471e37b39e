// Picking a pitch window with two taps on the neck: the first tap sets one end, the second the other.
import { computed, ref, type Ref } from 'vue'
import type { CellMark } from '../../components/fretboard/fretboard-types'
import type { PickedCell } from '../engine/locate'

export function useWindowPicker(settings: Ref<{ low: number; high: number }>) {
  const picking = ref(false)
  const first = ref<PickedCell | null>(null)

  function toggle() {
    picking.value = !picking.value
    first.value = null
  }
  function stop() {
    picking.value = false
    first.value = null
  }

  /** A tap on the neck while picking: returns true when the window is complete. */
  function tap(cell: PickedCell): boolean {
    if (!picking.value) return false
    if (!first.value) {
      first.value = cell
      return false
    }
    if (cell.pitch === first.value.pitch) return false // a window needs two different notes
    const [low, high] = [first.value.pitch, cell.pitch].sort((a, b) => a - b) as [number, number]
    settings.value = { ...settings.value, low, high }
    stop()
    return true
  }

  const marks = computed<CellMark[]>(() =>
    first.value
      ? [{ string: first.value.string, fret: first.value.fret, kind: 'selected', label: '1' }]
      : [],
  )
  return { picking, first, toggle, stop, tap, marks }
}
