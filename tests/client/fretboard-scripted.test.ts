// Scripted SVG on a drawn board: the run marker (animateRun) and the exported image (boardSvgMarkup).
import { mount } from '@vue/test-utils'
import { readFileSync } from 'node:fs'
import path from 'node:path'
import { afterEach, describe, expect, it, vi } from 'vitest'
import { animateRun } from '../../src/components/fretboard/animate-run'
import {
  ACCIDENTAL_FAMILY,
  boardSvgMarkup,
  exportBoardImage,
  withAccidentalFont,
} from '../../src/components/fretboard/board-export'
import FretboardBoard from '../../src/components/fretboard/FretboardBoard.vue'

const BASS_4 = [28, 33, 38, 43] // E1 A1 D2 G2

function drawnBoard() {
  const wrapper = mount(FretboardBoard, {
    props: {
      tuning: BASS_4,
      fretEnd: 5,
      labelMode: 'names',
      marks: [{ string: 1, fret: 2, kind: 'correct' }],
    },
    attachTo: document.body,
  })
  return { wrapper, svg: wrapper.find('svg').element as SVGSVGElement }
}

function centreOf(svg: SVGSVGElement, string: number, fret: number) {
  const hit = svg.querySelector(`[data-string="${string}"][data-fret="${fret}"] .fb-hit`)!
  const get = (name: string) => Number(hit.getAttribute(name))
  return { x: get('x') + get('width') / 2, y: get('y') + get('height') / 2 }
}

afterEach(() => {
  vi.useRealTimers()
  document.body.innerHTML = ''
})

describe('animateRun', () => {
  it('moves a marker through the cells in order, then removes it', async () => {
    // The animation's clock is faked and stepped: what is checked never depends on the machine's speed.
    vi.useFakeTimers({
      toFake: ['requestAnimationFrame', 'cancelAnimationFrame', 'performance', 'setTimeout'],
    })
    const { svg } = drawnBoard()
    const cells = [
      { string: 0, fret: 3 },
      { string: 1, fret: 0 },
      { string: 1, fret: 2 },
    ]
    // 600 BPM: a beat is 100 ms; each step glides for 35 % of a beat, then rests on the cell.
    const run = animateRun(svg, cells, { bpm: 600 })
    const marker = svg.querySelector('.fb-run-marker')!
    const at = () => ({
      x: Number(marker.getAttribute('cx')),
      y: Number(marker.getAttribute('cy')),
    })
    const expectAt = (cell: { string: number; fret: number }) => {
      const centre = centreOf(svg, cell.string, cell.fret)
      expect(at().x).toBeCloseTo(centre.x, 1)
      expect(at().y).toBeCloseTo(centre.y, 1)
    }
    expectAt(cells[0]!)
    await vi.advanceTimersByTimeAsync(170) // resting on the second cell (glide 100–135 ms)
    expectAt(cells[1]!)
    await vi.advanceTimersByTimeAsync(100) // resting on the third (glide 200–235 ms)
    expectAt(cells[2]!)
    expect(svg.querySelector('.fb-run-marker')).not.toBeNull()
    await vi.advanceTimersByTimeAsync(200) // past the last beat
    await run.finished
    expect(svg.querySelector('.fb-run-marker')).toBeNull()
  })

  it('does nothing for cells the board does not show', async () => {
    const { svg } = drawnBoard()
    const run = animateRun(svg, [{ string: 0, fret: 20 }], { bpm: 120 })
    await run.finished
    expect(svg.querySelector('.fb-run-marker')).toBeNull()
  })

  it('stop() removes the marker at once', async () => {
    const { svg } = drawnBoard()
    const run = animateRun(
      svg,
      [
        { string: 0, fret: 1 },
        { string: 0, fret: 2 },
      ],
      { bpm: 30 },
    )
    run.stop()
    await run.finished
    expect(svg.querySelector('.fb-run-marker')).toBeNull()
  })
})

describe('board export', () => {
  it('writes a stand-alone SVG: sized, with a background, marks and labels kept, hit areas dropped', () => {
    const { svg } = drawnBoard()
    const doc = new DOMParser().parseFromString(boardSvgMarkup(svg, '#ffffff'), 'image/svg+xml')
    const root = doc.documentElement
    const [, , width, height] = svg.getAttribute('viewBox')!.split(' ')
    expect(root.getAttribute('width')).toBe(width)
    expect(root.getAttribute('height')).toBe(height)
    expect(root.firstElementChild?.getAttribute('fill')).toBe('#ffffff')
    expect(doc.querySelectorAll('.fb-hit')).toHaveLength(0)
    expect(doc.querySelectorAll('.fb-correct')).toHaveLength(1)
    expect(doc.querySelectorAll('.fb-label').length).toBe(4 * 6)
    expect(svg.querySelectorAll('.fb-hit')).toHaveLength(4 * 6)
  })

  it('carries the given @font-face rules in a style element, so a picture keeps the typeface', () => {
    const { svg } = drawnBoard()
    const css =
      "@font-face{font-family:Roboto;font-weight:700;src:url(data:font/woff2;base64,AAAA) format('woff2')}"
    const doc = new DOMParser().parseFromString(
      boardSvgMarkup(svg, '#ffffff', css),
      'image/svg+xml',
    )
    expect(doc.querySelector('style')?.textContent).toBe(css)
    expect(doc.querySelectorAll('.fb-label').length).toBe(4 * 6)
  })

  it('gives an SVG blob for the svg format', async () => {
    const { svg } = drawnBoard()
    const blob = await exportBoardImage(svg, { format: 'svg' })
    expect(blob.type).toBe('image/svg+xml')
    expect(await blob.text()).toContain('<svg')
  })

  it('names the accidental font after the text font in every copied font list', () => {
    expect(withAccidentalFont('fill:red;font-family:Roboto, sans-serif;font-size:11px')).toBe(
      `fill:red;font-family:Roboto, "${ACCIDENTAL_FAMILY}", sans-serif;font-size:11px`,
    )
    const already = `font-family:Roboto, "${ACCIDENTAL_FAMILY}", sans-serif`
    expect(withAccidentalFont(already)).toBe(already)
    expect(withAccidentalFont('fill:red')).toBe('fill:red')
  })

  it('embeds the shipped ♯/♭ font (and Roboto) in the exported SVG, so a picture draws F♯ without a system font', async () => {
    // the fonts are fetched from our own origin; here from the files in the repository
    const fetched: string[] = []
    vi.stubGlobal('fetch', async (url: string) => {
      fetched.push(url)
      const bytes = readFileSync(path.join(process.cwd(), url.split('?')[0]!))
      return { blob: async () => new Blob([bytes]) } // the page's own Blob, as FileReader reads it
    })
    try {
      const { svg } = drawnBoard()
      const markup = await (await exportBoardImage(svg, { format: 'svg' })).text()

      const style = new DOMParser()
        .parseFromString(markup, 'image/svg+xml')
        .querySelector('style')?.textContent
      expect(fetched.some((url) => url.includes('accidentals-dejavu-sans'))).toBe(true)
      // ♭ ♮ ♯ are U+266D–U+266F; 𝄪 𝄫 are U+1D12A–U+1D12B (Unicode Musical Symbols)
      expect(style).toContain(`font-family:'${ACCIDENTAL_FAMILY}'`)
      expect(style).toContain('unicode-range:U+266D-266F')
      expect(style).toContain('unicode-range:U+1D12A-1D12B')
      expect(style?.match(/src:url\(data:font\/woff2;base64,/g)).toHaveLength(4)
      expect(style).toContain(`text{font-family:Roboto,"${ACCIDENTAL_FAMILY}",sans-serif}`)
    } finally {
      vi.unstubAllGlobals()
    }
  })
})
