// NotationStaff renders an exercise with the real VexFlow (SVG) in jsdom: clef and octave for the
// chosen view, the written/sounding toggle, the current note marked, TAB only when placed.
import { flushPromises } from '@vue/test-utils'
import { beforeAll, describe, expect, it } from 'vitest'
import NotationStaff from '../../src/components/notation/NotationStaff.vue'
import { cycleExercise, rangeRunExercise } from '../helpers/exercises'
import { mountWithApp } from '../helpers/mount'

beforeAll(() => {
  // jsdom lays nothing out and has no 2D canvas: give the staff a width and VexFlow text metrics.
  Object.defineProperty(HTMLElement.prototype, 'clientWidth', {
    configurable: true,
    get: () => 900,
  })
  HTMLCanvasElement.prototype.getContext = (() => ({
    font: '',
    measureText: (text: string) => ({
      width: text.length * 6,
      actualBoundingBoxAscent: 8,
      actualBoundingBoxDescent: 2,
      fontBoundingBoxAscent: 9,
      fontBoundingBoxDescent: 3,
    }),
  })) as unknown as HTMLCanvasElement['getContext']
})

async function mounted(props: InstanceType<typeof NotationStaff>['$props']) {
  const { wrapper } = mountWithApp(NotationStaff, { props, attachTo: document.body })
  const host = () => wrapper.get('[data-testid="notation"]')
  for (let i = 0; i < 50 && !host().find('svg').exists(); i += 1) {
    await flushPromises()
    await new Promise((resolve) => setTimeout(resolve, 20))
  }
  return { wrapper, host }
}

describe('NotationStaff', () => {
  it('draws a bass run as written pitch in bass clef with TAB, and says the part is an octave up', async () => {
    const { exercise } = rangeRunExercise()
    const { wrapper, host } = await mounted({ exercise })
    expect(host().attributes('data-view')).toBe('written')
    expect(wrapper.get('[data-testid="octave-note"]').text()).toBe(
      'Bass parts are written an octave above they sound.',
    )
    const svg = host().get('svg')
    // Every exercise note is drawn twice: on the staff and in the TAB.
    for (const index of [0, exercise.notes.length - 1]) {
      expect(svg.findAll(`.note-${index}`)).toHaveLength(2)
    }
    expect(host().attributes('aria-label')).toContain(
      `${exercise.notes.length} notes, F♯1 to C3 sounding`,
    )
    wrapper.unmount()
  })

  it('marks the current note on both staves and follows the index as it changes', async () => {
    const { exercise } = rangeRunExercise()
    const { wrapper, host } = await mounted({ exercise, currentIndex: 3 })
    expect(host().findAll('.notation-current')).toHaveLength(2)
    expect(host().findAll('.note-3.notation-current')).toHaveLength(2)
    await wrapper.setProps({ currentIndex: 5 })
    await flushPromises()
    expect(host().findAll('.note-5.notation-current')).toHaveLength(2)
    expect(host().findAll('.note-3.notation-current')).toHaveLength(0)
    wrapper.unmount()
  })

  it('switches to sounding pitch on request, and draws no TAB for notes without places', async () => {
    const { exercise } = cycleExercise()
    const bare = {
      ...exercise,
      notes: exercise.notes.map(({ string: _s, fret: _f, ...note }) => note),
    }
    const { wrapper, host } = await mounted({ exercise: bare })
    expect(host().findAll('.note-0')).toHaveLength(1)
    await wrapper.get('[data-testid="view-sounding"]').trigger('click')
    await flushPromises()
    expect(host().attributes('data-view')).toBe('sounding')
    expect(wrapper.get('[data-testid="octave-note"]').text()).toMatch(/sounding pitch/)
    expect(host().find('svg').exists()).toBe(true)
    wrapper.unmount()
  })
})
