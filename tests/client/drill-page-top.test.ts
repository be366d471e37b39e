// The top of every drill page: when the instrument cannot be loaded, each drill says so and goes on
// with a standard 4-string bass (before, only Neck Recall and Pitch Hunt did).
import { afterEach, describe, expect, it, vi } from 'vitest'
import { setPitchPlayer } from '../../src/audio'
import { mountRoute } from '../helpers/mount'
import { fakePlayer, stubApi } from './drill-test-kit'

afterEach(() => {
  vi.unstubAllGlobals()
  setPitchPlayer(null)
})

describe('DrillPageTop', () => {
  it.each([
    ['Range Runs', '/practice/runs'],
    ['Octave Scatter', '/practice/scatter'],
    ['Window Cycle', '/practice/cycle'],
  ])(
    'when the instruments cannot be loaded, %s warns and practises on a 4-string bass',
    async (name, path) => {
      setPitchPlayer(fakePlayer().player)
      stubApi({}) // every request answers 404
      const { wrapper } = await mountRoute(path, { attachTo: document.body })

      expect(wrapper.find('h1').text()).toBe(name)
      const warning = wrapper.find('.v-alert')
      expect(warning.text()).toContain('Your instrument could not be loaded')
      expect(warning.text()).toContain('practising on a standard 4-string bass')
      expect(wrapper.find('[data-testid="drill-instrument"]').text()).toContain('E A D G')
      wrapper.unmount()
    },
  )
})
