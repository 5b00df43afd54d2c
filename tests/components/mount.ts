import { mount, type ComponentMountingOptions } from '@vue/test-utils'
import { createPinia } from 'pinia'
import { createVuetify } from 'vuetify'
import type { Component } from 'vue'

/** Mounts a component the way the app runs it: with Pinia and Vuetify, attached so focus and blur behave. */
export function mountWithApp<T extends Component>(component: T, options: ComponentMountingOptions<T> = {}) {
  return mount(component, {
    attachTo: document.body,
    ...options,
    global: { plugins: [createPinia(), createVuetify()], ...options.global },
  } as ComponentMountingOptions<T>)
}
