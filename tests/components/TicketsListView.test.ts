import { afterEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import { hangsApi } from '../../src/api/hangs'
import { ticketsApi } from '../../src/api/tickets'
import LinesetTicketRequest from '../../src/components/LinesetTicketRequest.vue'
import { useSessionStore } from '../../src/stores/session'
import TicketsListView from '../../src/views/TicketsListView.vue'
import { personWith } from './fixtures'
import { mountWithApp } from './mount'
import { testRouter } from './router'
import { ticket } from './ticketFixtures'

vi.mock('../../src/api/tickets', () => ({ ticketsApi: { list: vi.fn(), open: vi.fn(), get: vi.fn() } }))
vi.mock('../../src/api/hangs', () => ({ hangsApi: { list: vi.fn(), read: vi.fn() } }))

let wrapper: VueWrapper | undefined
afterEach(() => {
  wrapper?.unmount()
  vi.clearAllMocks()
})

function mountAs(role: Parameters<typeof personWith>[0], component: typeof TicketsListView, props = {}) {
  const pinia = createPinia()
  setActivePinia(pinia)
  useSessionStore().user = personWith(role)
  const router = testRouter()
  wrapper = mountWithApp(component, { props, global: { plugins: [pinia, router] } })
  return { router }
}

describe('TicketsListView', () => {
  it('when tickets are listed, then each names its lineset, revision, bricks and state in words', async () => {
    vi.mocked(ticketsApi.list).mockResolvedValue([ticket(), ticket({ id: 'e2', state: 'loading' })])
    mountAs('stage-manager', TicketsListView)
    await flushPromises()
    const rows = wrapper!.findAll('[data-testid^="ticket-row-"]')
    expect(rows).toHaveLength(2)
    expect(rows[0]!.text()).toContain('Lineset 12, Main drape')
    expect(rows[0]!.text()).toContain('Revision 3, “Act two” · 4 × Full steel on, 2 × Half steel off')
    expect(rows[0]!.text()).toContain('Awaiting a decision')
    expect(rows[1]!.text()).toContain('Loading, do not operate')
  })

  it('when a state is picked, then only that state is asked for', async () => {
    vi.mocked(ticketsApi.list).mockResolvedValue([])
    mountAs('fly-operator', TicketsListView)
    await flushPromises()
    expect(wrapper!.find('[data-testid="tickets-empty"]').exists()).toBe(true)
    await wrapper!.find('[data-testid="tickets-filter-approved"]').trigger('click')
    await flushPromises()
    expect(ticketsApi.list).toHaveBeenLastCalledWith('approved')
  })
})

describe('LinesetTicketRequest', () => {
  const set = { id: ticket().linesetId, number: 12 }
  const latest = {
    id: 'h3',
    revision: 3,
    title: 'Act two',
    productionId: null,
    createdAt: '',
    createdBy: null,
    totalLoad: 300,
  }

  const savedWith = (checks: object[]) => vi.mocked(hangsApi.read).mockResolvedValue({ result: { checks } } as never)

  it('when a fly operator asks for the latest revision’s change, then the ticket opens and its page follows', async () => {
    vi.mocked(hangsApi.list).mockResolvedValue([latest])
    savedWith([])
    vi.mocked(ticketsApi.list).mockResolvedValue([])
    vi.mocked(ticketsApi.open).mockResolvedValue(ticket())
    const { router } = mountAs('fly-operator', LinesetTicketRequest as never, { lineset: set })
    await flushPromises()
    expect(wrapper!.text()).toContain('revision 3, “Act two”')
    await wrapper!.find('[data-testid="lineset-ask-change"]').trigger('click')
    await flushPromises()
    expect(ticketsApi.open).toHaveBeenCalledWith('h3')
    expect(router.currentRoute.value.name).toBe('ticket-detail')
  })

  it('when the latest revision says stop, then its findings show and asking is not offered', async () => {
    vi.mocked(hangsApi.list).mockResolvedValue([latest])
    vi.mocked(ticketsApi.list).mockResolvedValue([])
    savedWith([{ code: 'line-over-limit', level: 'danger', message: 'Line 3 carries 1,527 lb, over its limit' }])
    mountAs('fly-operator', LinesetTicketRequest as never, { lineset: set })
    await flushPromises()
    expect(hangsApi.read).toHaveBeenCalledWith(set.id, 'h3')
    expect(wrapper!.get('[data-testid="lineset-ask-stops"]').text()).toContain(
      'Line 3 carries 1,527 lb, over its limit',
    )
    expect(wrapper!.find('[data-testid="lineset-ask-change"]').exists()).toBe(false)
  })

  it('when the latest revision has been loaded already, then asking again says so', async () => {
    vi.mocked(hangsApi.list).mockResolvedValue([latest])
    vi.mocked(ticketsApi.list).mockResolvedValue([ticket({ state: 'loaded', hangId: 'h3' })])
    savedWith([])
    mountAs('fly-operator', LinesetTicketRequest as never, { lineset: set })
    await flushPromises()
    expect(wrapper!.get('[data-testid="lineset-latest-revision"]').text()).toContain('loaded already')
    expect(wrapper!.get('[data-testid="lineset-ask-change"]').text()).toBe('Ask again for this change')
  })

  it('when the lineset has an open ticket, then it links to it instead; a stage manager is never offered to ask', async () => {
    vi.mocked(hangsApi.list).mockResolvedValue([latest])
    savedWith([])
    vi.mocked(ticketsApi.list).mockResolvedValue([ticket({ state: 'approved' })])
    mountAs('fly-operator', LinesetTicketRequest as never, { lineset: set })
    await flushPromises()
    expect(wrapper!.find('[data-testid="lineset-open-ticket-link"]').exists()).toBe(true)
    expect(wrapper!.find('[data-testid="lineset-ask-change"]').exists()).toBe(false)
    wrapper!.unmount()
    vi.mocked(ticketsApi.list).mockResolvedValue([])
    mountAs('stage-manager', LinesetTicketRequest as never, { lineset: set })
    await flushPromises()
    expect(wrapper!.find('[data-testid="lineset-ask-change"]').exists()).toBe(false)
  })
})
