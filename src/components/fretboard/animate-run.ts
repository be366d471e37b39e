// A marker travelling across board cells in order (Range Runs shows the run up and back down with
// it), scripted with svg.js on the board's own <svg>. It steps at `bpm` quarter notes per minute.
import { SVG, type Circle, type Svg } from '@svgdotjs/svg.js'
import type { Cell } from './fretboard-types'

export interface RunAnimation {
  /** Resolves when the marker has visited every cell (or the animation was stopped). */
  finished: Promise<void>
  stop(): void
}

interface Point {
  x: number
  y: number
  r: number
}

/** The centre and marker size of a drawn cell, read from its hit area. */
function cellPoint(svg: SVGSVGElement, cell: Cell): Point | null {
  const hit = svg.querySelector(`[data-string="${cell.string}"][data-fret="${cell.fret}"] .fb-hit`)
  if (!hit) return null
  const [x, y, width, height] = ['x', 'y', 'width', 'height'].map((name) =>
    Number(hit.getAttribute(name)),
  )
  return { x: x! + width! / 2, y: y! + height! / 2, r: Math.min(width!, height!) * 0.36 }
}

const prefersReducedMotion = () =>
  typeof window !== 'undefined' && !!window.matchMedia?.('(prefers-reduced-motion: reduce)').matches

function drawMarker(canvas: Svg, first: Point): Circle {
  return canvas
    .circle(first.r * 2)
    .center(first.x, first.y)
    .addClass('fb-run-marker')
    .attr({ 'aria-hidden': 'true', 'pointer-events': 'none' })
}

/**
 * Animates a marker from cell to cell (skipping cells the board does not show), one step per beat:
 * a quick glide, then a rest on the cell. With reduced motion the marker jumps instead of gliding.
 */
export function animateRun(
  svgElement: SVGSVGElement,
  cells: Cell[],
  options: { bpm: number },
): RunAnimation {
  const points = cells
    .map((cell) => cellPoint(svgElement, cell))
    .filter((p): p is Point => p !== null)
  const [first] = points
  if (!first) return { finished: Promise.resolve(), stop: () => undefined }
  svgElement.querySelectorAll('.fb-run-marker').forEach((old) => old.remove())
  const beatMs = 60_000 / Math.max(1, options.bpm)
  const glideMs = prefersReducedMotion() ? 1 : beatMs * 0.35
  const marker = drawMarker(SVG(svgElement) as Svg, first)
  let resolve: () => void = () => undefined
  const finished = new Promise<void>((done) => (resolve = done))
  const stop = () => {
    marker.timeline().stop()
    marker.remove()
    resolve()
  }
  let runner = marker.animate(1, beatMs - 1)
  for (const point of points.slice(1)) {
    runner = runner
      .animate(glideMs, 0)
      .center(point.x, point.y)
      .animate(1, beatMs - glideMs - 1)
  }
  runner.after(stop)
  return { finished, stop }
}
