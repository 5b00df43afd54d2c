import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import type { Production, Role } from '../../shared/schemas/index.js'
import { productionsApi } from '../../src/api/productions'
import { ApiError } from '../../src/api/errors'
import ProductionsListView from '../../src/views/ProductionsListView.vue'
import { useSessionStore } from '../../src/stores/session'
import { mountWithApp } from './mount'
import { personWith } from './fixtures'
import { messagesUnder, press, typeInto } from './dialogFields'

vi.mock('../../src/api/productions', () => ({
  productionsApi: { list: vi.fn(), create: vi.fn(), update: vi.fn() },
}))

// Invented shows.
const running: Production = {
  id: 'p1',
  name: 'The Lamplighter’s Daughter',
  firstPerformance: '2026-03-14',
  lastPerformance: '2026-04-05',
  state: 'running',
  version: 2,
}
const closed: Production = {
  id: 'p2',
  name: 'Winter Harbour',
  firstPerformance: '2025-11-01',
  lastPerformance: '2025-11-30',
  state: 'closed',
  version: 5,
}

let wrapper: VueWrapper | undefined
beforeEach(() => vi.mocked(productionsApi.list).mockResolvedValue([running, closed]))
afterEach(() => {
  wrapper?.unmount()
  vi.clearAllMocks()
})

async function openProductions(role: Role) {
  const pinia = createPinia()
  setActivePinia(pinia)
  useSessionStore().user = personWith(role)
  wrapper = mountWithApp(ProductionsListView, { global: { plugins: [pinia] } })
  await flushPromises()
  return wrapper
}

const rows = (w: VueWrapper) =>
  w.findAll('[data-testid="productions-table"] tbody tr').map((row) => row.findAll('td').map((cell) => cell.text()))

describe('ProductionsListView', () => {
  it('when the productions are listed, then each shows its days in words and its state in words beside an icon', async () => {
    const w = await openProductions('stage-manager')
    // 14 March 2026 is a Saturday (common calendar).
    expect(rows(w)).toEqual([
      ['The Lamplighter’s Daughter', 'Sat, 14 Mar 2026', 'Sun, 5 Apr 2026', 'Running'],
      ['Winter Harbour', 'Sat, 1 Nov 2025', 'Sun, 30 Nov 2025', 'Closed'],
    ])
    expect(w.get('[data-testid="production-state-running"]').find('.mdi-play-circle-outline').exists()).toBe(true)
    expect(w.get('[data-testid="production-state-closed"]').find('.mdi-flag-checkered').exists()).toBe(true)
  })

  it.each<Role>(['stage-manager', 'fly-operator'])(
    'when a %s opens the productions, then nothing offers to change them',
    async (role) => {
      const w = await openProductions(role)
      expect(rows(w)).toHaveLength(2)
      expect(w.find('[data-testid="productions-add"]').exists()).toBe(false)
      expect(w.find('[data-testid="production-edit"]').exists()).toBe(false)
    },
  )

  it('when a technical director adds a production, then it is sent as typed, in planning unless chosen otherwise', async () => {
    const added: Production = { ...running, id: 'p3', name: 'Glass Orchard', state: 'planning', version: 0 }
    vi.mocked(productionsApi.create).mockResolvedValue(added)
    const w = await openProductions('technical-director')
    await w.get('[data-testid="productions-add"]').trigger('click')
    await flushPromises()
    typeInto('production-name', 'Glass Orchard')
    typeInto('production-first', '2026-03-14')
    typeInto('production-last', '2026-04-05')
    press('production-save')
    await flushPromises()
    expect(productionsApi.create).toHaveBeenCalledWith({
      name: 'Glass Orchard',
      firstPerformance: '2026-03-14',
      lastPerformance: '2026-04-05',
      state: 'planning',
    })
    expect(rows(w).map((row) => row[0])).toContain('Glass Orchard')
  })

  it('when the last performance comes before the first, then that field says so and nothing is sent', async () => {
    const w = await openProductions('administrator')
    await w.get('[data-testid="productions-add"]').trigger('click')
    await flushPromises()
    typeInto('production-name', 'Glass Orchard')
    typeInto('production-first', '2026-04-05')
    typeInto('production-last', '2026-03-14')
    press('production-save')
    await flushPromises()
    expect(messagesUnder('production-last')).toBe('Must not be before the first performance')
    expect(productionsApi.create).not.toHaveBeenCalled()
  })

  it('when a production is closed, then the change carries the version it was read at', async () => {
    vi.mocked(productionsApi.update).mockResolvedValue({ ...running, state: 'closed', version: 3 })
    const w = await openProductions('administrator')
    await w.findAll('[data-testid="production-edit"]')[0]!.trigger('click')
    await flushPromises()
    document.querySelector<HTMLInputElement>('[data-testid="production-state-closed-choice"] input')!.click()
    press('production-save')
    await flushPromises()
    expect(productionsApi.update).toHaveBeenCalledWith('p1', {
      name: 'The Lamplighter’s Daughter',
      firstPerformance: '2026-03-14',
      lastPerformance: '2026-04-05',
      state: 'closed',
      version: 2,
    })
    expect(rows(w)[0]![3]).toBe('Closed')
  })

  it('when the server says the name is taken, then it shows under the name', async () => {
    vi.mocked(productionsApi.create).mockRejectedValue(
      new ApiError(409, 'duplicate', 'A production named "Winter Harbour" already exists', { name: 'Already in use' }),
    )
    const w = await openProductions('technical-director')
    await w.get('[data-testid="productions-add"]').trigger('click')
    await flushPromises()
    typeInto('production-name', 'Winter Harbour')
    typeInto('production-first', '2026-01-01')
    typeInto('production-last', '2026-01-31')
    press('production-save')
    await flushPromises()
    expect(messagesUnder('production-name')).toBe('Already in use')
  })

  it('when someone else changed the production first, then the page says so and reads the list again', async () => {
    vi.mocked(productionsApi.update).mockRejectedValue(new ApiError(409, 'stale_version', 'Changed elsewhere'))
    const w = await openProductions('technical-director')
    await w.findAll('[data-testid="production-edit"]')[0]!.trigger('click')
    await flushPromises()
    const readsBefore = vi.mocked(productionsApi.list).mock.calls.length
    press('production-save')
    await flushPromises()
    expect(w.get('[data-testid="productions-stale"]').text()).toContain('Someone else changed that production')
    expect(vi.mocked(productionsApi.list).mock.calls.length).toBe(readsBefore + 1)
  })
})
