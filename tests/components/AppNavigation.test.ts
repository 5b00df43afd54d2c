import { afterEach, describe, expect, it } from 'vitest'
import { defineComponent, h } from 'vue'
import { mount, type VueWrapper } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import { createVuetify } from 'vuetify'
import { VApp } from 'vuetify/components'
import type { Role } from '../../shared/schemas/index.js'
import AppNavigation from '../../src/components/AppNavigation.vue'
import { testRouter } from './router'
import { useSessionStore } from '../../src/stores/session'
import { personWith } from './fixtures'

let wrapper: VueWrapper | undefined
afterEach(() => wrapper?.unmount())

async function navigationFor(role: Role) {
  const pinia = createPinia()
  setActivePinia(pinia)
  useSessionStore().user = personWith(role)
  const router = testRouter()
  await router.push('/bricks')
  const Shell = defineComponent(() => () => h(VApp, () => h(AppNavigation)))
  wrapper = mount(Shell, { attachTo: document.body, global: { plugins: [pinia, createVuetify(), router] } })
  return wrapper.findAll('[data-testid^="nav-"]').map((item) => item.attributes('data-testid'))
}

describe('AppNavigation', () => {
  it('when a stage manager is signed in, then only the pages every role reads are offered', async () => {
    expect(await navigationFor('stage-manager')).toEqual([
      'nav-board',
      'nav-linesets',
      'nav-tickets',
      'nav-bricks',
      'nav-item-library',
      'nav-productions',
    ])
  })

  it('when a technical director is signed in, then venue settings are offered but people are not', async () => {
    expect(await navigationFor('technical-director')).toEqual([
      'nav-board',
      'nav-linesets',
      'nav-tickets',
      'nav-bricks',
      'nav-item-library',
      'nav-productions',
      'nav-venue-settings',
    ])
  })

  it('when an administrator is signed in, then every page is offered', async () => {
    expect(await navigationFor('administrator')).toEqual([
      'nav-board',
      'nav-linesets',
      'nav-tickets',
      'nav-bricks',
      'nav-item-library',
      'nav-productions',
      'nav-people',
      'nav-outbox',
      'nav-venue-settings',
    ])
  })
})

describe('AppNavigation for keyboards and screen readers', () => {
  it('when the menu shows, then its entries are links each reached with Tab, in no list role that forbids links', async () => {
    await navigationFor('administrator')
    const links = wrapper!.findAll('[data-testid^="nav-"]')
    for (const link of links) {
      expect(link.element.tagName).toBe('A')
      expect(link.attributes('tabindex')).toBe('0')
      expect(link.element.parentElement?.getAttribute('role')).not.toMatch(/^(list|listbox)$/)
    }
    expect(wrapper!.get('[data-testid=app-navigation]').attributes('aria-label')).toBe('Main menu')
  })
})
