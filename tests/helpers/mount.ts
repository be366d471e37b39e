// Mounting components with Vuetify, a fresh Pinia and the app's real routes (in memory): a page is
// mounted through its route, so a test fails when the route table or the drill registry breaks.
import {
  flushPromises,
  mount,
  type ComponentMountingOptions,
  type VueWrapper,
} from '@vue/test-utils'
import { expect, vi } from 'vitest'
import { createPinia, setActivePinia } from 'pinia'
import { defineComponent, h, type Component } from 'vue'
import { createMemoryHistory, createRouter, RouterView, type Router } from 'vue-router'
import { createVuetify } from 'vuetify'
import * as components from 'vuetify/components'
import * as directives from 'vuetify/directives'
import { routes } from '../../src/router/routes'

function appPlugins() {
  const pinia = createPinia()
  setActivePinia(pinia)
  const vuetify = createVuetify({ components, directives })
  const router = createRouter({ history: createMemoryHistory(), routes })
  return { pinia, vuetify, router }
}

export function mountWithApp<C extends Component>(
  component: C,
  options: ComponentMountingOptions<C> = {},
) {
  const { pinia, vuetify, router } = appPlugins()
  const wrapper = mount(component, {
    ...options,
    global: { plugins: [pinia, vuetify, router], ...(options.global ?? {}) },
  } as ComponentMountingOptions<C>)
  return { wrapper, router, pinia }
}

/** Opens `path` the way the app does (its route's lazy page in a RouterView); guards are left out. */
export async function mountRoute(path: string, options: { attachTo?: HTMLElement } = {}) {
  const { pinia, vuetify, router } = appPlugins()
  await router.push(path)
  await router.isReady()
  const page = defineComponent({ render: () => h(RouterView) })
  const wrapper = mount(page, { ...options, global: { plugins: [pinia, vuetify, router] } })
  await flushPromises()
  return { wrapper, router, pinia }
}

/** Resolves once the router has finished its next navigation (lazy pages loaded, whatever it takes). */
export function nextNavigation(router: Router): Promise<void> {
  return new Promise((resolve) => {
    const stop = router.afterEach(() => {
      stop()
      resolve()
    })
  })
}

/** Waits until `selector` shows: a part a page fetches apart from itself (a settings form). */
export async function untilShown(wrapper: VueWrapper, selector: string): Promise<void> {
  // a first import of the part's module is transformed on demand, slow on a loaded machine
  await vi.waitFor(() => expect(wrapper.find(selector).exists()).toBe(true), { timeout: 15_000 })
}
