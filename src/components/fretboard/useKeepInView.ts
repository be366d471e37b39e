// Keeps the question on screen when the neck is wider than its box (a phone): scrolls so the asked
// cell and the marked places show, and hands the keyboard back to the board when focus fell away.
import { nextTick, onMounted, watch, type Ref } from 'vue'
import type { CellBox } from './board-geometry'

/** A horizontal stretch of the neck in CSS pixels from the board's left edge. */
export interface Stretch {
  left: number
  right: number
}

const MARGIN = 12

/**
 * Where to scroll a box of width `view` (now at `at`) so the question shows: all marked places when
 * they fit together, else the asked cell, else the start of the marked places. Returns `at` when
 * nothing needs to move.
 */
export function revealOffset(
  at: number,
  view: number,
  marked: Stretch | null,
  asked: Stretch | null,
): number {
  const visible = (s: Stretch) => s.left >= at && s.right <= at + view
  const whole = spanOf([marked, asked])
  if (!whole) return at
  if (whole.right - whole.left + 2 * MARGIN <= view) {
    if (visible(whole)) return at
    return Math.max(0, (whole.left + whole.right) / 2 - view / 2)
  }
  const focus = asked ?? { left: whole.left, right: whole.left + view - 2 * MARGIN }
  if (visible(focus)) return at
  return Math.max(0, focus.left < at ? focus.left - MARGIN : focus.right - view + MARGIN)
}

function spanOf(stretches: (Stretch | null)[]): Stretch | null {
  const present = stretches.filter((s): s is Stretch => s !== null)
  if (present.length === 0) return null
  return {
    left: Math.min(...present.map((s) => s.left)),
    right: Math.max(...present.map((s) => s.right)),
  }
}

export interface KeepInViewOptions {
  scroller: Ref<HTMLElement | null>
  svg: Ref<SVGSVGElement | null>
  /** The board's width in SVG units (to turn units into pixels). */
  unitWidth: () => number
  asked: () => CellBox | null
  marked: () => CellBox[]
  /** Whether the board takes the keyboard back when focus has fallen to the page. */
  holdFocus: () => boolean
  focusCurrent: () => void
  /** What changes with each question or answer (watched). */
  changes: () => unknown
}

export function useKeepInView(options: KeepInViewOptions) {
  const stretchOf = (boxes: CellBox[], scale: number): Stretch | null =>
    boxes.length === 0
      ? null
      : spanOf(boxes.map((b) => ({ left: b.x * scale, right: (b.x + b.width) * scale })))

  function reveal() {
    const box = options.scroller.value
    const width = options.svg.value?.getBoundingClientRect().width ?? 0
    if (!box || width === 0 || box.scrollWidth <= box.clientWidth + 1) return
    const scale = width / options.unitWidth()
    const asked = options.asked()
    const to = revealOffset(
      box.scrollLeft,
      box.clientWidth,
      stretchOf(options.marked(), scale),
      asked ? stretchOf([asked], scale) : null,
    )
    if (Math.abs(to - box.scrollLeft) > 1) box.scrollLeft = to
  }

  function holdFocus() {
    if (!options.holdFocus()) return
    const active = document.activeElement
    if (active && active !== document.body && active.isConnected) return
    options.focusCurrent()
  }

  const update = () =>
    nextTick(() => {
      reveal()
      holdFocus()
    })
  onMounted(update)
  watch(options.changes, update)
  return { reveal }
}
