// Mounting components with Vuetify, a fresh Pinia and a memory router.
import { mount, type ComponentMountingOptions } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import type { Component } from 'vue'
import { createMemoryHistory, createRouter } from 'vue-router'
import { createVuetify } from 'vuetify'
import * as components from 'vuetify/components'
import * as directives from 'vuetify/directives'

export function mountWithApp<C extends Component>(
  component: C,
  options: ComponentMountingOptions<C> = {},
) {
  const pinia = createPinia()
  setActivePinia(pinia)
  const vuetify = createVuetify({ components, directives })
  const router = createRouter({
    history: createMemoryHistory(),
    routes: [{ path: '/:any(.*)*', name: 'any', component: { template: '<div />' } }],
  })
  for (const name of [
    'sign-in',
    'register',
    'forgot-password',
    'landing',
    'practice',
    'studio',
    'admin-users',
  ]) {
    router.addRoute({ path: `/${name}`, name, component: { template: '<div />' } })
  }
  const wrapper = mount(component, {
    ...options,
    global: { plugins: [pinia, vuetify, router], ...(options.global ?? {}) },
  } as ComponentMountingOptions<C>)
  return { wrapper, router, pinia }
}
