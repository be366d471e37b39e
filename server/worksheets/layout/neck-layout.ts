// Geometry of a printed neck diagram (pure): evenly spaced frets, so every cell is big enough to
// write in; string 0 (the lowest) at the bottom, as in TAB and in the app; mirrored for left hands.
import type { Frame } from '../pdf/sheet-document'

export interface NeckOptions {
  strings: number
  from: number
  to: number
  hand: 'right' | 'left'
}

/** One place to write a note: its string and fret and the centre of its cell. */
export interface NeckCell {
  string: number
  fret: number
  x: number
  y: number
}

export interface NeckLayout {
  /** y of each string line, index = string (0 = lowest, drawn at the bottom). */
  stringY: number[]
  /** Fret wires: x and whether it is the nut. */
  wires: { x: number; nut: boolean }[]
  /** Horizontal extent of the string lines. */
  left: number
  right: number
  cells: NeckCell[]
  /** Where each fret's column is centred (fret numbers, inlay dots). */
  columns: { fret: number; x: number }[]
  /** x of the string names, beside the open-string end. */
  labelX: number
  labelAlign: 'left' | 'right'
  /** Vertical distance between strings. */
  gap: number
  /** Width of one fret column. */
  cellWidth: number
}

/** Room kept for the string names beside the neck. */
export const LABEL_ROOM = 22
/** The open-string column is narrower than a fret: notes are written before the nut. */
const OPEN_COLUMN = 0.75

/**
 * Lays out a neck in a box: string lines evenly spaced top to bottom (the lowest string at the
 * bottom), fret columns from `from` to `to` evenly spaced, an open-string column before the nut
 * when `from` is 0, string names on the nut side (the right for a left-handed player).
 *
 * @example
 * neckLayout({ x: 0, y: 0, width: 300, height: 60 }, { strings: 4, from: 0, to: 12, hand: 'right' }).cells.length // 52
 */
export function neckLayout(box: Frame, options: NeckOptions): NeckLayout {
  const { strings, from, to } = options
  const gap = strings > 1 ? box.height / (strings - 1) : 0
  const stringY = Array.from({ length: strings }, (_, s) => box.y + box.height - s * gap)
  const units = (from === 0 ? OPEN_COLUMN : 0) + (to - Math.max(from, 1) + 1)
  const cellWidth = (box.width - LABEL_ROOM) / units
  const start = box.x + LABEL_ROOM
  const columnLeft = (fret: number) =>
    fret === 0
      ? start
      : start + (from === 0 ? OPEN_COLUMN : 0) * cellWidth + (fret - Math.max(from, 1)) * cellWidth
  const columns = Array.from({ length: to - from + 1 }, (_, i) => {
    const fret = from + i
    const width = fret === 0 ? OPEN_COLUMN * cellWidth : cellWidth
    return { fret, x: columnLeft(fret) + width / 2 }
  })
  const firstWire = from === 0 ? columnLeft(1) : columnLeft(from)
  const wires = Array.from({ length: to - Math.max(from, 1) + 2 }, (_, i) => ({
    x: firstWire + i * cellWidth,
    nut: from <= 1 && i === 0,
  }))
  const layout: NeckLayout = {
    stringY,
    wires,
    left: from === 0 ? start : firstWire,
    right: box.x + box.width,
    cells: columns.flatMap(({ fret, x }) => stringY.map((y, string) => ({ string, fret, x, y }))),
    columns,
    labelX: start - 6,
    labelAlign: 'right',
    gap,
    cellWidth,
  }
  return options.hand === 'left' ? mirrored(layout, box) : layout
}

function mirrored(layout: NeckLayout, box: Frame): NeckLayout {
  const flip = (x: number) => box.x + box.x + box.width - x
  return {
    ...layout,
    wires: layout.wires.map((wire) => ({ ...wire, x: flip(wire.x) })),
    left: flip(layout.right),
    right: flip(layout.left),
    cells: layout.cells.map((cell) => ({ ...cell, x: flip(cell.x) })),
    columns: layout.columns.map((column) => ({ ...column, x: flip(column.x) })),
    labelX: flip(layout.labelX),
    labelAlign: 'left',
  }
}
