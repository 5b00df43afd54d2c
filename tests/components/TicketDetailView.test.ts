import { afterEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import type { Role, TicketView } from '../../shared/schemas/index.js'
import { ApiError } from '../../src/api/errors'
import { hangsApi } from '../../src/api/hangs'
import { ticketsApi } from '../../src/api/tickets'
import type { Check } from '../../shared/schemas/calculation-result.js'
import { useSessionStore } from '../../src/stores/session'
import TicketDetailView from '../../src/views/TicketDetailView.vue'
import { personWith } from './fixtures'
import { mountWithApp } from './mount'
import { testRouter } from './router'
import { FULL, HALF, ticket } from './ticketFixtures'

vi.mock('../../src/api/tickets', () => ({
  ticketsApi: {
    list: vi.fn(),
    get: vi.fn(),
    open: vi.fn(),
    approve: vi.fn(),
    decline: vi.fn(),
    withdraw: vi.fn(),
    startLoading: vi.fn(),
    complete: vi.fn(),
  },
}))

vi.mock('../../src/api/hangs', () => ({ hangsApi: { list: vi.fn(), read: vi.fn(), save: vi.fn() } }))

let wrapper: VueWrapper | undefined
afterEach(() => {
  wrapper?.unmount()
  vi.clearAllMocks()
  sessionStorage.clear() // ticks kept on the tab would carry into the next test's ticket
})

/** Opens the ticket page; `checks` are the findings stored with the ticket's hang revision. */
async function openTicket(role: Role, shown: TicketView, checks: Check[] = []) {
  vi.mocked(ticketsApi.get).mockResolvedValue(shown)
  vi.mocked(hangsApi.read).mockResolvedValue({ result: { checks } } as never)
  const pinia = createPinia()
  setActivePinia(pinia)
  useSessionStore().user = personWith(role)
  const router = testRouter()
  await router.push(`/tickets/${shown.id}`)
  wrapper = mountWithApp(TicketDetailView, { props: { id: shown.id }, global: { plugins: [pinia, router] } })
  await flushPromises()
  return wrapper
}
const has = (w: VueWrapper, id: string) => w.find(`[data-testid="${id}"]`).exists()
const click = async (w: VueWrapper, id: string) => {
  await w.find(`[data-testid="${id}"]`).trigger('click')
  await flushPromises()
}

describe('TicketDetailView: deciding', () => {
  it('when the hang says stop, then the director reads why and approval is held back while declining stays open', async () => {
    const over = 'The batten carries 1,631 lb, over its rated load of 1,200 lb'
    const w = await openTicket('technical-director', ticket(), [
      { code: 'over-rated-load', level: 'danger', message: over },
      { code: 'travel-shift', level: 'caution', message: 'Look again at the out trim' },
      { code: 'note', level: 'info', message: 'Not shown' },
    ])
    expect(hangsApi.read).toHaveBeenCalledWith(ticket().linesetId, ticket().hangId)
    const findings = w.get('[data-testid="ticket-hang-findings"]').text()
    expect(findings).toContain(over)
    expect(findings).toContain('Look again at the out trim')
    expect(findings).not.toContain('Not shown')
    expect(has(w, 'ticket-hang-stops')).toBe(true)
    expect(has(w, 'ticket-decision-stops')).toBe(true)
    expect(w.get('[data-testid="ticket-approve"]').attributes('disabled')).toBeDefined()
    expect(w.get('[data-testid="ticket-decline"]').attributes('disabled')).toBeUndefined()
  })

  it('when the hang is clear, then the page says so and approval is offered', async () => {
    const w = await openTicket('technical-director', ticket())
    expect(has(w, 'ticket-hang-clear')).toBe(true)
    expect(has(w, 'ticket-decision-stops')).toBe(false)
    expect(w.get('[data-testid="ticket-approve"]').attributes('disabled')).toBeUndefined()
  })

  it('when a director reads a ticket storage cannot cover, then the shortfall shows before deciding and approval is not offered', async () => {
    const w = await openTicket(
      'technical-director',
      ticket({ shortfall: [{ brickTypeId: FULL, name: 'Full steel', missing: 2 }] }),
    )
    expect(w.find('[data-testid="ticket-shortfall"]').text()).toContain('2 × Full steel missing')
    expect(w.find('[data-testid="ticket-approve"]').attributes('disabled')).toBeDefined()
    expect(w.find('[data-testid="ticket-expected-balance"]').text()).toContain('3.5 lb batten heavy')
    expect(w.find(`[data-testid="ticket-brick-${HALF}"]`).text()).toContain('−2 off')
  })

  it('when a director declines without a comment, then it asks for one and sends nothing; with one, it sends the version and comment', async () => {
    const w = await openTicket('technical-director', ticket())
    await click(w, 'ticket-decline')
    expect(w.text()).toContain('Say why it is declined')
    expect(ticketsApi.decline).not.toHaveBeenCalled()
    vi.mocked(ticketsApi.decline).mockResolvedValue(ticket({ state: 'declined', version: 1 }))
    await w.find('[data-testid="ticket-comment"] textarea').setValue('Not before the dress rehearsal')
    await click(w, 'ticket-decline')
    expect(ticketsApi.decline).toHaveBeenCalledWith(ticket().id, {
      version: 0,
      comment: 'Not before the dress rehearsal',
    })
    expect(has(w, 'ticket-state-declined')).toBe(true)
    expect(has(w, 'ticket-decision')).toBe(false)
  })

  it('when a director approves, then the version goes with it and the page shows the ticket approved', async () => {
    const w = await openTicket('technical-director', ticket())
    vi.mocked(ticketsApi.approve).mockResolvedValue(ticket({ state: 'approved', version: 1 }))
    await click(w, 'ticket-approve')
    expect(ticketsApi.approve).toHaveBeenCalledWith(ticket().id, { version: 0 })
    expect(has(w, 'ticket-state-approved')).toBe(true)
  })

  it('when someone decided first, then the 409 is said and the ticket is read again', async () => {
    const w = await openTicket('administrator', ticket())
    vi.mocked(ticketsApi.approve).mockRejectedValue(
      new ApiError(
        409,
        'ticket_state',
        'This ticket has already been approved. Only a ticket awaiting a decision can be approved.',
      ),
    )
    vi.mocked(ticketsApi.get).mockResolvedValue(ticket({ state: 'approved', version: 1 }))
    await click(w, 'ticket-approve')
    expect(ticketsApi.get).toHaveBeenCalledTimes(2)
    expect(w.find('[data-testid="ticket-move-error"]').text()).toContain('This ticket has already been approved.')
    expect(has(w, 'ticket-state-approved')).toBe(true)
  })

  it('when the director opened the ticket, then no decision is offered and the page says another must decide', async () => {
    const me = personWith('technical-director')
    const w = await openTicket('technical-director', ticket({ openedBy: { id: me.id, name: me.name } }))
    expect(has(w, 'ticket-decision')).toBe(false)
    expect(has(w, 'ticket-own')).toBe(true)
    expect(has(w, 'ticket-withdraw')).toBe(true)
  })

  it('when a fly operator or a stage manager reads a requested ticket, then no decision is offered', async () => {
    for (const role of ['fly-operator', 'stage-manager'] as const) {
      const w = await openTicket(role, ticket())
      expect(has(w, 'ticket-decision')).toBe(false)
      expect(has(w, 'ticket-withdraw')).toBe(false)
      w.unmount()
    }
  })
})

describe('TicketDetailView: guided loading', () => {
  it('when weight goes on and comes off, then the arbor comes off first, then the batten; the batten loads first, then the arbor; each step opens after the one before', async () => {
    const w = await openTicket('fly-operator', ticket({ state: 'loading', version: 2 }))
    const steps = w.findAll(
      '[data-testid^="ticket-step-"][data-testid]:not([data-testid^="ticket-step-tick"]):not([data-testid="ticket-step-caution"])',
    )
    expect(steps.map((step) => step.attributes('data-testid'))).toEqual([
      'ticket-step-lock',
      'ticket-step-call',
      'ticket-step-arbor-off',
      'ticket-step-batten-off',
      'ticket-step-batten-on',
      'ticket-step-arbor-on',
      'ticket-step-call-done',
      'ticket-step-lock-after',
    ])
    expect(w.findAll('[data-testid="ticket-step-caution"]')).toHaveLength(8)
    expect(w.find('[data-testid="ticket-step-arbor-on"]').text()).toContain('4 × Full steel')
    const second = w.find('[data-testid="ticket-step-tick-call"] input')
    expect(second.attributes('disabled')).toBeDefined()
    expect(has(w, 'ticket-complete')).toBe(false)
    await w.find('[data-testid="ticket-step-tick-lock"] input').setValue(true)
    expect(w.find('[data-testid="ticket-step-tick-call"] input').attributes('disabled')).toBeUndefined()
  })

  it('when every step is ticked, then the completion form records the bricks actually loaded and the felt balance', async () => {
    const w = await openTicket('fly-operator', ticket({ state: 'loading', version: 2 }))
    const keys = ['lock', 'call', 'arbor-off', 'batten-off', 'batten-on', 'arbor-on', 'call-done', 'lock-after']
    for (const key of keys) {
      await w.find(`[data-testid="ticket-step-tick-${key}"] input`).setValue(true)
      await flushPromises()
    }
    expect(has(w, 'ticket-complete')).toBe(true)
    await w.find(`[data-testid="ticket-loaded-${FULL}"] input`).setValue('15')
    await click(w, 'ticket-finish')
    expect(w.text()).toContain('Say how the set felt at the rail')
    expect(ticketsApi.complete).not.toHaveBeenCalled()
    vi.mocked(ticketsApi.complete).mockResolvedValue(ticket({ state: 'loaded', version: 3 }))
    await w.find('[data-testid="ticket-felt-arbor-heavy"] input').setValue(true)
    await w.find('[data-testid="ticket-note"] textarea').setValue('One extra full brick')
    await click(w, 'ticket-finish')
    expect(ticketsApi.complete).not.toHaveBeenCalled()
    expect(w.find('[data-testid="ticket-differs"]').text()).toContain('15 × Full steel recorded, the plan was 14')
    await w.find('[data-testid="ticket-differs-confirm"] input').setValue(true)
    await click(w, 'ticket-finish')
    expect(ticketsApi.complete).toHaveBeenCalledWith(ticket().id, {
      version: 2,
      loaded: [
        { brickTypeId: FULL, count: 15 },
        { brickTypeId: HALF, count: 1 },
      ],
      feltBalance: 'arbor-heavy',
      note: 'One extra full brick',
      differsFromPlan: true,
    })
    expect(has(w, 'ticket-state-loaded')).toBe(true)
  })

  it('when an approved ticket is opened by the crew, then loading is started with its version; a stage manager is offered none of it', async () => {
    const w = await openTicket('fly-operator', ticket({ state: 'approved', version: 1 }))
    vi.mocked(ticketsApi.startLoading).mockResolvedValue(ticket({ state: 'loading', version: 2 }))
    await click(w, 'ticket-start-loading')
    expect(ticketsApi.startLoading).toHaveBeenCalledWith(ticket().id, 1)
    expect(has(w, 'ticket-checklist')).toBe(true)
    w.unmount()
    const reader = await openTicket('stage-manager', ticket({ state: 'loading', version: 2 }))
    expect(has(reader, 'ticket-checklist')).toBe(false)
    expect(has(reader, 'ticket-start')).toBe(false)
    expect(has(reader, 'app-cautions')).toBe(true)
  })
})
