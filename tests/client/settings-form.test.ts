// A drill's settings form loads apart from its page: until it arrives (or if it cannot) the setup
// card says so instead of showing only its Start button.
import { flushPromises } from '@vue/test-utils'
import { defineComponent, h } from 'vue'
import { describe, expect, it } from 'vitest'
import { settingsForm } from '../../src/drills/engine/settings-form'
import { mountWithApp } from '../helpers/mount'

const Form = defineComponent({ render: () => h('form', { 'data-testid': 'the-form' }, 'Key') })

function pageWith(loading: Promise<{ default: typeof Form }>) {
  const Setup = settingsForm(loading)
  return mountWithApp(defineComponent({ render: () => h('div', [h(Setup)]) })).wrapper
}

describe('a drill settings form loaded apart from its page', () => {
  it('when its code is still on the way, then the card says the settings are loading', async () => {
    const wrapper = pageWith(new Promise(() => {}))
    await flushPromises()
    expect(wrapper.find('[data-testid="settings-pending"]').text()).toBe('Loading the settings…')
    expect(wrapper.find('[data-testid="the-form"]').exists()).toBe(false)
  })

  it('when its code arrives, then the form replaces the placeholder', async () => {
    let arrive: (m: { default: typeof Form }) => void = () => {}
    const wrapper = pageWith(new Promise((resolve) => (arrive = resolve)))
    await flushPromises()
    arrive({ default: Form, [Symbol.toStringTag]: 'Module' } as { default: typeof Form }) // as import() gives it
    await flushPromises()
    expect(wrapper.find('[data-testid="the-form"]').exists()).toBe(true)
    expect(wrapper.find('[data-testid="settings-pending"]').exists()).toBe(false)
  })

  it('when its code cannot be loaded, then the card says so and that Start still works', async () => {
    const failing = Promise.reject(new Error('offline'))
    failing.catch(() => {})
    const wrapper = pageWith(failing)
    await flushPromises()
    expect(wrapper.find('[data-testid="settings-pending"]').text()).toContain(
      'The settings could not be loaded.',
    )
    expect(wrapper.text()).toContain('Start still works')
  })
})
