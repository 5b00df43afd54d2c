import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import type { BrickType, Role } from '../../shared/schemas/index.js'
import { brickStockApi } from '../../src/api/brick-stock'
import { brickTypesApi } from '../../src/api/brick-types'
import { ApiError } from '../../src/api/errors'
import BrickTypesListView from '../../src/views/BrickTypesListView.vue'
import { useSessionStore } from '../../src/stores/session'
import { useVenueStore } from '../../src/stores/venue'
import { mountWithApp } from './mount'
import { personWith, venue } from './fixtures'

vi.mock('../../src/api/brick-types', () => ({
  brickTypesApi: { list: vi.fn(), create: vi.fn(), update: vi.fn(), remove: vi.fn() },
}))

vi.mock('../../src/api/brick-stock', () => ({ brickStockApi: { list: vi.fn() } }))

const steel: BrickType = {
  id: 'a1',
  name: 'Full steel',
  material: 'Steel',
  unitWeight: 19.5,
  thickness: 2,
  quantityOwned: 1400,
  version: 2,
  unitSystem: 'imperial',
}

let wrapper: VueWrapper | undefined
beforeEach(() => {
  vi.mocked(brickTypesApi.list).mockResolvedValue([steel])
  vi.mocked(brickStockApi.list).mockResolvedValue([
    {
      brickTypeId: 'a1',
      name: 'Full steel',
      owned: 1400,
      onArbors: 300,
      reserved: 20,
      inStorage: 1080,
      retired: false,
      byLineset: [
        { linesetId: '2c6a8d10-0000-4000-8000-000000000005', number: 5, name: 'First electric', count: 36 },
        { linesetId: '2c6a8d10-0000-4000-8000-000000000010', number: 10, name: 'Second electric', count: 264 },
      ],
    },
  ])
})
afterEach(() => {
  wrapper?.unmount()
  vi.clearAllMocks()
})

async function openBricks(role: Role) {
  const pinia = createPinia()
  setActivePinia(pinia)
  useSessionStore().user = personWith(role)
  useVenueStore().venue = venue
  wrapper = mountWithApp(BrickTypesListView, { global: { plugins: [pinia] } })
  await flushPromises()
  return wrapper
}

describe('BrickTypesListView', () => {
  it('when a fly operator opens the bricks, then the stock and its total weight show with no way to change them', async () => {
    const w = await openBricks('fly-operator')
    const cells = w.findAll('[data-testid="brick-types-table"] tbody td').map((cell) => cell.text())
    // 19.5 lb x 1400 = 27,300 lb.
    expect(cells).toEqual(['Full steel', 'Steel', '19.5 lb', '2 in', '1,400', '27,300 lb'])
    for (const testid of ['brick-types-add', 'brick-type-edit', 'brick-type-delete'])
      expect(w.find(`[data-testid="${testid}"]`).exists(), testid).toBe(false)
  })

  it('when a technical director changes a brick type, then the dialog sends the figures with the version read', async () => {
    vi.mocked(brickTypesApi.update).mockResolvedValue({ ...steel, quantityOwned: 1380, version: 3 })
    const w = await openBricks('technical-director')
    await w.get('[data-testid="brick-type-edit"]').trigger('click')
    await flushPromises()
    const quantity = document.querySelector<HTMLInputElement>('[data-testid="brick-type-quantity"] input')
    expect(quantity?.value).toBe('1400')
    quantity!.value = '1380'
    quantity!.dispatchEvent(new Event('input'))
    document.querySelector<HTMLButtonElement>('[data-testid="brick-type-save"]')?.click()
    await flushPromises()
    expect(brickTypesApi.update).toHaveBeenCalledWith('a1', {
      name: 'Full steel',
      material: 'Steel',
      unitWeight: 19.5,
      thickness: 2,
      quantityOwned: 1380,
      unitSystem: 'imperial',
      version: 2,
    })
  })

  it('when someone else changed the brick type first, then the page says so and reads the list again', async () => {
    vi.mocked(brickTypesApi.update).mockRejectedValue(new ApiError(409, 'stale_version', 'Changed elsewhere'))
    const w = await openBricks('administrator')
    await w.get('[data-testid="brick-type-edit"]').trigger('click')
    await flushPromises()
    const readsBefore = vi.mocked(brickTypesApi.list).mock.calls.length
    document.querySelector<HTMLButtonElement>('[data-testid="brick-type-save"]')?.click()
    await flushPromises()
    expect(w.get('[data-testid="brick-types-stale"]').text()).toContain('Someone else changed that brick type')
    expect(vi.mocked(brickTypesApi.list).mock.calls.length).toBe(readsBefore + 1)
  })

  it('when anyone opens the bricks, then the stock shows owned, on arbors, reserved and in storage, and which arbors hold them', async () => {
    const w = await openBricks('stage-manager')
    const cells = w.findAll('[data-testid="brick-stock-table"] tbody td').map((cell) => cell.text())
    expect(cells.slice(0, 5)).toEqual(['Full steel', '1,400', '300', '20', '1,080'])
    expect(w.get('[data-testid="brick-stock-place-5"]').text()).toBe('5 · First electric: 36')
    expect(w.get('[data-testid="brick-stock-place-10"]').text()).toBe('10 · Second electric: 264')
  })
})
