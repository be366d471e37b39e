// Where everything on the drawn neck goes, in SVG units: fret wires from the theory core's 12-TET
// distances (or even spacing), string lines, cell boxes; mirrored for left-handed players.
import { evenFretDistances, fretDistances, inlayFrets, type Inlay } from '@/theory'

/** Vertical distance between strings (SVG units); also the height of a cell. */
export const STRING_GAP = 34
/** Width of the open-string column left of the nut. */
export const OPEN_WIDTH = 44
/** The narrowest fretted cell drawn, so high frets stay readable on true spacing. */
export const MIN_CELL = 28
/** A short span (a few frets) still gets this much neck, so it is not a sliver. */
export const MIN_FRETTED_WIDTH = 520
export const SIDE_PAD = 8
/** Room at the nut side for the string names. */
export const NAME_GUTTER = 24
export const TOP_PAD = 10
/** Room under the neck for fret numbers. */
export const NUMBER_BAND = 22
export const MAX_FRET = 24
const DEFAULT_SCALE_MM = 864

export interface BoardSpec {
  strings: number
  fretStart: number
  fretEnd: number
  scaleLengthMm: number
  evenSpacing: boolean
  leftHanded: boolean
}

export interface CellBox {
  string: number
  fret: number
  /** Centre of the cell, where markers and labels go. */
  cx: number
  cy: number
  /** Left edge and size of the cell's hit area. */
  x: number
  y: number
  width: number
  height: number
  /** Marker radius: fits the smaller of the cell's width and height. */
  r: number
}

export interface FretWire {
  fret: number
  x: number
}

export interface BoardLayout {
  width: number
  height: number
  /** The fingerboard rectangle (frets only; the open column sits outside it). */
  neck: { x: number; y: number; width: number; height: number }
  showsNut: boolean
  nutX: number
  /** Centre of the string-name gutter at the nut side (mirrored for left hands). */
  nameX: number
  wires: FretWire[]
  stringY: number[]
  cells: CellBox[]
  inlays: { fret: number; cx: number; cy: number[] }[]
  numbers: { fret: number; x: number; y: number }[]
}

const clamp = (value: number, low: number, high: number) =>
  Math.min(high, Math.max(low, Math.round(Number.isFinite(value) ? value : low)))

/** Puts any props into a drawable spec: 1–10 strings, frets 0–24 with start ≤ end. */
export function normalizeSpec(input: Partial<BoardSpec> & { strings: number }): BoardSpec {
  const fretStart = clamp(input.fretStart ?? 0, 0, MAX_FRET)
  const scale = input.scaleLengthMm ?? DEFAULT_SCALE_MM
  return {
    strings: clamp(input.strings, 1, 10),
    fretStart,
    fretEnd: clamp(input.fretEnd ?? 12, fretStart, MAX_FRET),
    scaleLengthMm: Number.isFinite(scale) && scale > 0 ? scale : DEFAULT_SCALE_MM,
    evenSpacing: input.evenSpacing ?? false,
    leftHanded: input.leftHanded ?? false,
  }
}

// Fret wire distances from the nut in millimetres, for wires 0..fretEnd.
function wireDistances(spec: BoardSpec): number[] {
  if (spec.fretEnd === 0) return [0]
  const spacing = spec.evenSpacing ? evenFretDistances : fretDistances
  return spacing(spec.scaleLengthMm, spec.fretEnd)
}

// Units per millimetre: the narrowest visible cell gets MIN_CELL, and the neck is never a sliver.
function unitsPerMm(distances: number[], firstWire: number): number {
  let narrowest = Infinity
  for (let wire = firstWire + 1; wire < distances.length; wire += 1) {
    narrowest = Math.min(narrowest, (distances[wire] ?? 0) - (distances[wire - 1] ?? 0))
  }
  if (!Number.isFinite(narrowest)) return 1
  const span = (distances[distances.length - 1] ?? 0) - (distances[firstWire] ?? 0)
  return Math.max(MIN_CELL / narrowest, MIN_FRETTED_WIDTH / span)
}

function stringYs(strings: number): number[] {
  // String 0 (lowest pitch) at the bottom, as in tab and as a player looks down at the neck.
  return Array.from({ length: strings }, (_, s) => TOP_PAD + STRING_GAP * (strings - 1 - s + 0.5))
}

function inlayPositions(spec: BoardSpec, wires: FretWire[], neckTop: number, neckHeight: number) {
  const visible = spec.fretEnd === 0 ? [] : inlayFrets(spec.fretEnd)
  return visible
    .filter((inlay: Inlay) => inlay.fret >= Math.max(spec.fretStart, 1))
    .map((inlay) => {
      const left = wires.find((w) => w.fret === inlay.fret - 1)?.x ?? 0
      const right = wires.find((w) => w.fret === inlay.fret)?.x ?? 0
      const middle = neckTop + neckHeight / 2
      const cy = inlay.double
        ? [neckTop + neckHeight / 4, neckTop + (3 * neckHeight) / 4]
        : [middle]
      return { fret: inlay.fret, cx: (left + right) / 2, cy }
    })
}

/**
 * Lays out a neck: the open column and nut when fret 0 is shown, wires at true 12-TET distances
 * (or even), one cell per string × fret. Left-handed boards are mirrored left to right.
 */
export function layoutBoard(spec: BoardSpec): BoardLayout {
  const showsNut = spec.fretStart === 0
  const firstWire = Math.max(spec.fretStart, 1) - 1
  const distances = wireDistances(spec)
  const k = unitsPerMm(distances, firstWire)
  const origin = SIDE_PAD + NAME_GUTTER + (showsNut ? OPEN_WIDTH : 0)
  const frettedWidth = ((distances[spec.fretEnd] ?? 0) - (distances[firstWire] ?? 0)) * k
  const width = origin + frettedWidth + SIDE_PAD
  const mirror = (x: number) => (spec.leftHanded ? width - x : x)
  const neckHeight = STRING_GAP * spec.strings
  const height = TOP_PAD + neckHeight + NUMBER_BAND
  const wires: FretWire[] = []
  for (let fret = firstWire; fret <= spec.fretEnd && spec.fretEnd > 0; fret += 1) {
    wires.push({
      fret,
      x: mirror(origin + ((distances[fret] ?? 0) - (distances[firstWire] ?? 0)) * k),
    })
  }
  const stringY = stringYs(spec.strings)
  const cells = layoutCells(spec, wires, stringY, mirror)
  const neckLeft = Math.min(mirror(origin), mirror(origin + frettedWidth))
  return {
    width,
    height,
    neck: { x: neckLeft, y: TOP_PAD, width: frettedWidth, height: neckHeight },
    showsNut,
    nutX: mirror(origin),
    nameX: mirror(SIDE_PAD + NAME_GUTTER / 2),
    wires,
    stringY,
    cells,
    inlays: inlayPositions(spec, wires, TOP_PAD, neckHeight),
    numbers: fretNumbers(spec, wires, mirror, TOP_PAD + neckHeight + NUMBER_BAND * 0.72),
  }
}

function fretColumns(spec: BoardSpec, wires: FretWire[], mirror: (x: number) => number) {
  const columns: { fret: number; left: number; right: number }[] = []
  if (spec.fretStart === 0) {
    const [a, b] = [mirror(SIDE_PAD + NAME_GUTTER), mirror(SIDE_PAD + NAME_GUTTER + OPEN_WIDTH)]
    columns.push({ fret: 0, left: Math.min(a, b), right: Math.max(a, b) })
  }
  for (let i = 1; i < wires.length; i += 1) {
    const [a, b] = [wires[i - 1]?.x ?? 0, wires[i]?.x ?? 0]
    columns.push({ fret: wires[i]?.fret ?? 0, left: Math.min(a, b), right: Math.max(a, b) })
  }
  return columns
}

function layoutCells(
  spec: BoardSpec,
  wires: FretWire[],
  stringY: number[],
  mirror: (x: number) => number,
): CellBox[] {
  const columns = fretColumns(spec, wires, mirror)
  return stringY.flatMap((cy, string) =>
    columns.map(({ fret, left, right }) => ({
      string,
      fret,
      cx: (left + right) / 2,
      cy,
      x: left,
      y: cy - STRING_GAP / 2,
      width: right - left,
      height: STRING_GAP,
      r: Math.min(right - left, STRING_GAP) * 0.42,
    })),
  )
}

function fretNumbers(spec: BoardSpec, wires: FretWire[], mirror: (x: number) => number, y: number) {
  return fretColumns(spec, wires, mirror).map(({ fret, left, right }) => ({
    fret,
    x: (left + right) / 2,
    y,
  }))
}
