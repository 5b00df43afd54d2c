import { afterEach, describe, expect, it } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import type { TicketView } from '../../shared/schemas/index.js'
import TicketDetailChecklist from '../../src/components/TicketDetailChecklist.vue'
import { forgetSignedInData } from '../../src/stores/forget'
import { mountWithApp } from './mount'
import { ticket } from './ticketFixtures'

const STEPS = ['lock', 'call', 'arbor-off', 'batten-off', 'batten-on', 'arbor-on', 'call-done', 'lock-after']
const loading = ticket({ state: 'loading', version: 2 })

let wrapper: VueWrapper | undefined
afterEach(() => {
  wrapper?.unmount()
  sessionStorage.clear()
})

const mountChecklist = (shown: TicketView = loading) =>
  (wrapper = mountWithApp(TicketDetailChecklist, { props: { ticket: shown } }))

async function tickSteps(w: VueWrapper, keys: readonly string[]) {
  for (const key of keys) {
    await w.get(`[data-testid="ticket-step-tick-${key}"] input`).setValue(true)
    await flushPromises()
  }
}

const tickedSteps = (w: VueWrapper) =>
  STEPS.filter((key) => (w.get(`[data-testid="ticket-step-tick-${key}"] input`).element as HTMLInputElement).checked)
const isOpen = (w: VueWrapper, key: string) =>
  w.get(`[data-testid="ticket-step-tick-${key}"] input`).attributes('disabled') === undefined

// A reload is the page built again from nothing on the same tab: the component mounted afresh, sessionStorage kept.
async function reload(shown: TicketView = loading) {
  wrapper!.unmount()
  const w = mountChecklist(shown)
  await flushPromises()
  return w
}

describe('TicketDetailChecklist: ticks survive a reload', () => {
  it('when three steps are ticked and the page reloads, then those three are ticked again and the fourth is next', async () => {
    await tickSteps(mountChecklist(), STEPS.slice(0, 3))
    const w = await reload()
    expect(tickedSteps(w)).toEqual(STEPS.slice(0, 3))
    expect(isOpen(w, 'batten-off')).toBe(true)
    expect(isOpen(w, 'batten-on')).toBe(false)
    expect(w.emitted('done')).toEqual([[false]])
    expect(JSON.parse(sessionStorage.getItem(`loftledger:loading-ticks:${loading.id}:2`)!)).toEqual(STEPS.slice(0, 3))
  })

  it('when every step was ticked before the reload, then the checklist says it is done again at once', async () => {
    await tickSteps(mountChecklist(), STEPS)
    const w = await reload()
    expect(tickedSteps(w)).toEqual(STEPS)
    expect(w.emitted('done')).toEqual([[true]])
  })

  it('when a step is unticked, then the reload keeps only the steps before it', async () => {
    const first = mountChecklist()
    await tickSteps(first, STEPS.slice(0, 4))
    await first.get('[data-testid="ticket-step-tick-call"] input').setValue(false)
    await flushPromises()
    expect(tickedSteps(await reload())).toEqual(['lock'])
  })

  it('when the ticket has moved on to another version, then no ticks of the old one come back', async () => {
    await tickSteps(mountChecklist(), STEPS.slice(0, 3))
    const w = await reload(ticket({ state: 'loading', version: 3 }))
    expect(tickedSteps(w)).toEqual([])
    expect(w.emitted('done')).toEqual([[false]])
  })

  it('when another ticket is opened, then its steps start unticked', async () => {
    await tickSteps(mountChecklist(), STEPS.slice(0, 3))
    const other = ticket({ id: 'e0000000-0000-4000-8000-000000000002', state: 'loading', version: 2 })
    expect(tickedSteps(await reload(other))).toEqual([])
  })

  it('when the person signs out, then the kept ticks are forgotten', async () => {
    await tickSteps(mountChecklist(), STEPS.slice(0, 3))
    forgetSignedInData(undefined)
    expect(tickedSteps(await reload())).toEqual([])
  })

  it('when what was kept cannot be read, then the steps start unticked rather than failing', async () => {
    sessionStorage.setItem(`loftledger:loading-ticks:${loading.id}:2`, '{not json')
    const w = mountChecklist()
    await flushPromises()
    expect(tickedSteps(w)).toEqual([])
  })
})
