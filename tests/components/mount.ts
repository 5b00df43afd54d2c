import { mount, type ComponentMountingOptions } from '@vue/test-utils'
import { createPinia } from 'pinia'
import { createVuetify } from 'vuetify'
import type { Component } from 'vue'

/**
 * Mounts a component the way the app runs it: with Vuetify and Pinia (a fresh one unless the test brings its own
 * plugins, e.g. a prepared Pinia and a memory router), attached so focus and blur behave.
 */
export function mountWithApp<T extends Component>(component: T, options: ComponentMountingOptions<T> = {}) {
  const plugins = [createVuetify(), ...(options.global?.plugins ?? [createPinia()])]
  return mount(component, {
    attachTo: document.body,
    ...options,
    global: { ...options.global, plugins },
  } as ComponentMountingOptions<T>)
}
