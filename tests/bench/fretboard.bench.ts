// Benchmark (npm run bench:fretboard): applying a marks update to a full 8-string × 25-fret board
// (frets 0–24) against the baseline of re-rendering the whole board (a remount, as a key change
// does), both in the same run. Figures are printed by Vitest's bench reporter; nothing is asserted.
import { mount } from '@vue/test-utils'
import { bench, describe } from 'vitest'
import { defineComponent, h, type PropType } from 'vue'
import FretboardBoard from '../../src/components/fretboard/FretboardBoard.vue'
import type { CellMark } from '../../src/components/fretboard/fretboard-types'

const EIGHT = [30, 35, 40, 45, 50, 55, 59, 64] // F#1 B1 E2 A2 D3 G3 B3 E4

const Host = defineComponent({
  props: {
    marks: { type: Array as PropType<CellMark[]>, required: true },
    boardKey: { type: Number, required: true },
  },
  setup(props) {
    return () =>
      h(FretboardBoard, {
        key: props.boardKey,
        tuning: EIGHT,
        fretStart: 0,
        fretEnd: 24,
        labelMode: 'names',
        keyTonic: 'Eb',
        keyScale: 'major',
        marks: props.marks,
      })
  },
})

// A typical feedback step: the answered cell turns correct, a new target appears, four hints move.
function feedbackStep(step: number): CellMark[] {
  const at = (n: number) => ({ string: (step + n) % 8, fret: (step * 7 + n * 5) % 25 })
  return [
    { ...at(0), kind: 'correct', label: 'E♭' },
    { ...at(1), kind: 'target' },
    ...[2, 3, 4, 5].map((n) => ({ ...at(n), kind: 'hint' as const })),
  ]
}

const BASE_MARKS = Array.from({ length: 40 }, (_, i) => ({
  string: i % 8,
  fret: (i * 3) % 25,
  kind: 'highlight' as const,
}))

describe('fretboard 8 × 25, labels on, 40 standing marks', () => {
  const updated = mount(Host, { props: { marks: BASE_MARKS, boardKey: 0 } })
  let step = 0
  bench(
    'apply a marks update (changed cells only)',
    async () => {
      step += 1
      await updated.setProps({ marks: [...BASE_MARKS, ...feedbackStep(step)] })
    },
    { time: 2000, warmupTime: 300 },
  )

  const remounted = mount(Host, { props: { marks: BASE_MARKS, boardKey: 0 } })
  let key = 0
  bench(
    'baseline: re-render the whole board (remount)',
    async () => {
      key += 1
      await remounted.setProps({ marks: [...BASE_MARKS, ...feedbackStep(key)], boardKey: key })
    },
    { time: 2000, warmupTime: 300 },
  )
})
