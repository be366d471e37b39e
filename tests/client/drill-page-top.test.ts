// The top of every drill page: when the instrument cannot be loaded, each drill says so and goes on
// with a standard 4-string bass (before, only Neck Recall and Pitch Hunt did).
import { flushPromises } from '@vue/test-utils'
import { afterEach, describe, expect, it, vi } from 'vitest'
import { setPitchPlayer } from '../../src/audio'
import OctaveScatterView from '../../src/views/OctaveScatterView.vue'
import RangeRunsView from '../../src/views/RangeRunsView.vue'
import WindowCycleView from '../../src/views/WindowCycleView.vue'
import { mountWithApp } from '../helpers/mount'
import { fakePlayer, stubApi } from './drill-test-kit'

afterEach(() => {
  vi.unstubAllGlobals()
  setPitchPlayer(null)
})

describe('DrillPageTop', () => {
  it.each([
    ['Range Runs', RangeRunsView],
    ['Octave Scatter', OctaveScatterView],
    ['Window Cycle', WindowCycleView],
  ])(
    'when the instruments cannot be loaded, %s warns and practises on a 4-string bass',
    async (name, view) => {
      setPitchPlayer(fakePlayer().player)
      stubApi({}) // every request answers 404
      const { wrapper } = mountWithApp(view, { attachTo: document.body })
      await flushPromises()

      expect(wrapper.find('h1').text()).toBe(name)
      const warning = wrapper.find('.v-alert')
      expect(warning.text()).toContain('Your instrument could not be loaded')
      expect(warning.text()).toContain('practising on a standard 4-string bass')
      expect(wrapper.find('[data-testid="drill-instrument"]').text()).toContain('E A D G')
      wrapper.unmount()
    },
  )
})
