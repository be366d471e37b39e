// Marks: distinct shapes per kind, heat fills, only changed cells re-render, contrast in both themes.
import { mount } from '@vue/test-utils'
import { describe, expect, it } from 'vitest'
import { nextTick, type ComponentOptions } from 'vue'
import FretboardBoard from '../../src/components/fretboard/FretboardBoard.vue'
import type { CellMark } from '../../src/components/fretboard/fretboard-types'
import {
  contrastRatio,
  heatColor,
  HEAT_RAMPS,
  luminance,
  textOn,
} from '../../src/components/fretboard/heat-scale'
import vuetify from '../../src/plugins/vuetify'

const parseRgb = (css: string) => {
  if (css.startsWith('#')) return css
  const [r = 0, g = 0, b = 0] = (css.match(/\d+/g) ?? []).map(Number)
  return `#${[r, g, b].map((c) => c.toString(16).padStart(2, '0')).join('')}`
}
const EIGHT = [30, 35, 40, 45, 50, 55, 59, 64] // F#1 B1 E2 A2 D3 G3 B3 E4

// Counts re-renders per component name: `updated` runs only when a component rendered again.
function renderCounter() {
  const counts = new Map<string, number>()
  const mixin: ComponentOptions = {
    updated(this: { $options: { name?: string; __name?: string } }) {
      const name = this.$options.name ?? this.$options.__name ?? '?'
      counts.set(name, (counts.get(name) ?? 0) + 1)
    },
  }
  return { counts, mixin }
}

function fullBoard(marks: CellMark[]) {
  const { counts, mixin } = renderCounter()
  const wrapper = mount(FretboardBoard, {
    props: { tuning: EIGHT, fretStart: 0, fretEnd: 24, marks, labelMode: 'names' },
    global: { mixins: [mixin] },
  })
  return { wrapper, counts }
}

describe('marks update', () => {
  it('re-renders only the cells whose marks changed, never the neck', async () => {
    const { wrapper, counts } = fullBoard([{ string: 0, fret: 3, kind: 'target' }])
    const untouched = wrapper.find('[data-string="7"][data-fret="24"]').element
    await wrapper.setProps({
      marks: [
        { string: 0, fret: 3, kind: 'target' },
        { string: 2, fret: 7, kind: 'correct', label: 'A' },
      ],
    })
    await nextTick()
    expect(counts.get('FretboardCell')).toBe(1)
    expect(counts.get('FretboardNeck')).toBeUndefined()
    expect(wrapper.find('[data-string="7"][data-fret="24"]').element).toBe(untouched)
    expect(wrapper.find('[data-string="2"][data-fret="7"]').attributes('data-marks')).toBe(
      'correct',
    )
  })

  it('a new marks array with equal contents re-renders no cell', async () => {
    const marks: CellMark[] = [{ string: 1, fret: 1, kind: 'wrong', label: 'C' }]
    const { wrapper, counts } = fullBoard(marks)
    await wrapper.setProps({ marks: marks.map((mark) => ({ ...mark })) })
    expect(counts.get('FretboardCell')).toBeUndefined()
  })

  it('moving a mark re-renders the two cells involved', async () => {
    const { wrapper, counts } = fullBoard([{ string: 4, fret: 4, kind: 'selected' }])
    await wrapper.setProps({ marks: [{ string: 4, fret: 5, kind: 'selected' }] })
    expect(counts.get('FretboardCell')).toBe(2)
  })
})

describe('shapes', () => {
  it('draws each kind with its own shape, so colour is never the only cue', () => {
    const kinds: CellMark['kind'][] = [
      'correct',
      'wrong',
      'target',
      'highlight',
      'selected',
      'hint',
      'root',
    ]
    const marks = kinds.map((kind, fret) => ({ string: 0, fret, kind }))
    const { wrapper } = fullBoard(marks)
    const shape = (fret: number, selector: string) =>
      wrapper.find(`[data-string="0"][data-fret="${fret}"] ${selector}`).exists()
    expect(shape(0, 'circle.fb-correct') && shape(0, 'path.fb-glyph')).toBe(true)
    expect(shape(1, 'rect.fb-wrong') && shape(1, 'path.fb-glyph')).toBe(true)
    expect(shape(2, 'circle.fb-target')).toBe(true)
    expect(shape(3, 'rect.fb-band')).toBe(true)
    expect(shape(4, 'rect.fb-selected')).toBe(true)
    expect(shape(5, 'circle.fb-hint')).toBe(true)
    expect(shape(6, 'path.fb-root')).toBe(true)
    expect(wrapper.find('[data-string="0"][data-fret="1"]').attributes('aria-label')).toContain(
      'wrong',
    )
  })

  it('fills heat cells from the chosen ramp and writes readable text on them', () => {
    const { wrapper } = fullBoard([{ string: 3, fret: 2, kind: 'highlight', heat: 1 }])
    const heat = wrapper.find('[data-string="3"][data-fret="2"] .fb-heat')
    expect(heat.attributes('fill')).toBe(heatColor('accuracy', 1))
    // a style, not an attribute: the stylesheet's label colour would win over an attribute
    const style = (wrapper.find('[data-string="3"][data-fret="2"] .fb-label').element as SVGElement)
      .style
    const text = parseRgb(style.fill)
    expect(contrastRatio(text, heat.attributes('fill')!)).toBeGreaterThanOrEqual(4.5)
  })
})

describe('colours', () => {
  const themes = vuetify.theme.computedThemes.value
  const MARK_COLOURS = ['success', 'error', 'primary', 'secondary', 'accent'] as const

  // WCAG 2.1 SC 1.4.11 (non-text contrast): graphical objects need 3:1 against what is next to them
  it.each(['lakewoodLight', 'lakewoodDark'])(
    'every mark colour stands out from the neck in %s',
    (name) => {
      const colors = themes[name]!.colors as Record<string, string>
      for (const key of MARK_COLOURS) {
        expect(contrastRatio(colors[key]!, colors['surface-variant']!), key).toBeGreaterThanOrEqual(
          3,
        )
      }
    },
  )

  // WCAG 2.1 SC 1.4.3: text 4.5:1 — labels on correct/wrong/root markers
  it.each(['lakewoodLight', 'lakewoodDark'])(
    'labels on filled markers are readable in %s',
    (name) => {
      const colors = themes[name]!.colors as Record<string, string>
      for (const key of ['success', 'error', 'secondary']) {
        expect(contrastRatio(colors[`on-${key}`]!, colors[key]!), key).toBeGreaterThanOrEqual(4.5)
      }
    },
  )

  it.each(Object.keys(HEAT_RAMPS) as (keyof typeof HEAT_RAMPS)[])(
    'the %s ramp darkens steadily (readable without hue)',
    (scale) => {
      const steps = Array.from({ length: 11 }, (_, i) => luminance(heatColor(scale, i / 10)))
      for (let i = 1; i < steps.length; i += 1) expect(steps[i]!).toBeLessThan(steps[i - 1]!)
      expect(contrastRatio(heatColor(scale, 0), heatColor(scale, 1))).toBeGreaterThan(5)
      for (let i = 0; i <= 10; i += 1)
        expect(
          contrastRatio(textOn(heatColor(scale, i / 10)), heatColor(scale, i / 10)),
        ).toBeGreaterThanOrEqual(4.5)
    },
  )
})
