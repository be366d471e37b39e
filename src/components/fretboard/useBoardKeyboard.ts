// Keyboard for the board: arrows move the active cell the way they point on screen (mirrored for
// left-handed boards), Home/End jump to the first/last fret, Enter/Space select, and — when typing
// answers — a note letter plus an optional #/b answers for the active cell.
import { onBeforeUnmount, ref } from 'vue'
import type { Cell } from './fretboard-types'

/** How long a typed letter waits for a # or b before it is sent as the answer. */
export const TYPING_BUFFER_MS = 700

export interface BoardKeyboardOptions {
  bounds: () => { strings: number; fretStart: number; fretEnd: number; leftHanded: boolean }
  typingAnswers: () => boolean
  move: (cell: Cell) => void
  select: (cell: Cell) => void
  answer: (text: string, cell: Cell, typedAt: number) => void
}

const clamp = (value: number, low: number, high: number) => Math.min(high, Math.max(low, value))

function stepFor(key: string, leftHanded: boolean): { string: number; fret: number } | null {
  const towardBody = leftHanded ? -1 : 1
  if (key === 'ArrowUp') return { string: 1, fret: 0 } // string 0 is drawn at the bottom
  if (key === 'ArrowDown') return { string: -1, fret: 0 }
  if (key === 'ArrowRight') return { string: 0, fret: towardBody }
  if (key === 'ArrowLeft') return { string: 0, fret: -towardBody }
  return null
}

/** The cell a navigation key moves to (null: not a navigation key). */
function movedCell(
  key: string,
  cell: Cell,
  bounds: ReturnType<BoardKeyboardOptions['bounds']>,
): Cell | null {
  const { strings, fretStart, fretEnd, leftHanded } = bounds
  if (key === 'Home') return { string: cell.string, fret: fretStart }
  if (key === 'End') return { string: cell.string, fret: fretEnd }
  const step = stepFor(key, leftHanded)
  if (!step) return null
  return {
    string: clamp(cell.string + step.string, 0, strings - 1),
    fret: clamp(cell.fret + step.fret, fretStart, fretEnd),
  }
}

export function useBoardKeyboard(options: BoardKeyboardOptions) {
  /** The letter (and accidental) typed so far, shown to the player while it waits. */
  const pending = ref('')
  let pendingCell: Cell | null = null
  let pendingAt = 0
  let timer: ReturnType<typeof setTimeout> | undefined

  function commit() {
    clearTimeout(timer)
    const [text, cell] = [pending.value, pendingCell]
    pending.value = ''
    pendingCell = null
    if (text && cell) options.answer(text, cell, pendingAt)
  }

  function startLetter(letter: string, cell: Cell) {
    commit()
    pending.value = letter.toUpperCase()
    pendingCell = cell
    pendingAt = performance.now()
    timer = setTimeout(commit, TYPING_BUFFER_MS)
  }

  // 'b' after a letter is a flat; otherwise it is the note B.
  function typed(key: string, cell: Cell): boolean {
    const isAccidental = pending.value.length === 1 && /^[#b♯♭]$/.test(key)
    if (isAccidental) {
      pending.value += key === '♯' ? '#' : key === '♭' ? 'b' : key
      commit()
      return true
    }
    if (/^[a-gA-G]$/.test(key)) {
      startLetter(key, cell)
      return true
    }
    return false
  }

  /** Handles one key on the focused cell; returns true when the key was used (prevent default). */
  function onKey(event: KeyboardEvent, cell: Cell): boolean {
    if (event.altKey || event.ctrlKey || event.metaKey) return false
    const next = movedCell(event.key, cell, options.bounds())
    if (next) {
      commit()
      options.move(next)
      return true
    }
    if (event.key === 'Enter' || event.key === ' ') {
      if (pending.value) commit()
      else options.select(cell)
      return true
    }
    if (event.key === 'Escape' && pending.value) {
      clearTimeout(timer)
      pending.value = ''
      return true
    }
    return options.typingAnswers() ? typed(event.key, cell) : false
  }

  onBeforeUnmount(() => clearTimeout(timer))
  return { onKey, pending, commit }
}
