// The contract of <FretboardBoard>: what drills and charts pass in and get back.
import type { AccidentalPreference, Position } from '../../theory'

/** A cell is a string × fret position; 0 = lowest-pitched string, fret 0 = open string. */
export type Cell = Position

/** How a cell is marked. Each kind has its own shape as well as colour (colour-blind safe). */
export type MarkKind = 'correct' | 'wrong' | 'target' | 'highlight' | 'selected' | 'hint' | 'root'

export interface CellMark extends Cell {
  kind: MarkKind
  /** Text inside the marker (e.g. a note name "E♭", a degree "3", an order number). */
  label?: string
  /** 0..1 fill intensity for heat maps (accuracy/speed); ignored by other kinds. */
  heat?: number
}

export type LabelMode = 'names' | 'degrees' | 'none'

export interface FretboardProps {
  tuning: number[]
  /** First and last fret drawn (0 = include the nut and open strings). */
  fretStart?: number
  fretEnd?: number
  /** Used for true 12-TET spacing; millimetres. */
  scaleLengthMm?: number
  evenSpacing?: boolean
  leftHanded?: boolean
  /** Labels drawn on every cell (names spelled in the key, degrees, or nothing = blank board). */
  labelMode?: LabelMode
  keyTonic?: string
  keyScale?: string
  accidentals?: AccidentalPreference
  marks?: CellMark[]
  /** Cells that can be selected; all when omitted. */
  selectable?: (cell: Cell) => boolean
  /** The cell with keyboard focus (v-model:active-cell). */
  activeCell?: Cell | null
  /** When true, typing a note letter (+ # / b) emits `answer` for the active cell (Neck Recall). */
  typingAnswers?: boolean
  /** Heat-map colour scale for marks with `heat`. */
  heatScale?: 'accuracy' | 'speed'
  /** The cell the question asks about (data-asked="true"); kept in view on narrow screens. */
  asked?: Cell | null
  /** Take the keyboard back after each question when focus has fallen to the page (drills). */
  holdFocus?: boolean
}

export interface FretboardEmits {
  select: [cell: Cell & { pitch: number }]
  /** typedAt: performance.now() of the first key of the answer, so waiting for a ♯/♭ adds no time. */
  answer: [text: string, cell: Cell, typedAt: number]
  'update:activeCell': [cell: Cell | null]
}
