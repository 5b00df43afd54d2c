import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import type { ItemType, Role, Venue } from '../../shared/schemas/index.js'
import { itemTypesApi } from '../../src/api/item-types'
import { ApiError } from '../../src/api/errors'
import ItemTypesListView from '../../src/views/ItemTypesListView.vue'
import { useSessionStore } from '../../src/stores/session'
import { useVenueStore } from '../../src/stores/venue'
import { mountWithApp } from './mount'
import { personWith, venue } from './fixtures'
import { messagesUnder, press, typeInto } from './dialogFields'

vi.mock('../../src/api/item-types', () => ({
  itemTypesApi: { list: vi.fn(), create: vi.fn(), update: vi.fn(), retire: vi.fn() },
}))

// Made-up library entries; the weights are plausible, from memory.
const spot: ItemType = {
  id: 't1',
  name: 'Ellipsoidal spot, 26°',
  category: 'lighting',
  unitWeight: 17,
  allowancePerUnit: 2.5,
  notes: 'With clamp and safety cable allowance',
  version: 4,
  unitSystem: 'imperial',
}
const speaker: ItemType = {
  id: 't2',
  name: 'Point-source speaker',
  category: 'audio-video',
  unitWeight: 48,
  allowancePerUnit: 6,
  notes: '',
  version: 1,
  unitSystem: 'imperial',
}

let wrapper: VueWrapper | undefined
beforeEach(() => vi.mocked(itemTypesApi.list).mockResolvedValue([speaker, spot]))
afterEach(() => {
  wrapper?.unmount()
  vi.clearAllMocks()
})

async function openLibrary(role: Role, atVenue: Venue = venue) {
  const pinia = createPinia()
  setActivePinia(pinia)
  useSessionStore().user = personWith(role)
  useVenueStore().venue = atVenue
  wrapper = mountWithApp(ItemTypesListView, { global: { plugins: [pinia] } })
  await flushPromises()
  return wrapper
}

const rows = (w: VueWrapper) =>
  w.findAll('[data-testid="item-types-table"] tbody tr').map((row) => row.findAll('td').map((cell) => cell.text()))

describe('ItemTypesListView', () => {
  it('when an imperial venue opens its library, then each type shows in pounds, lighting before audio', async () => {
    const w = await openLibrary('fly-operator')
    expect(rows(w)).toEqual([
      ['Ellipsoidal spot, 26°', 'Lighting', '17 lb', '2.5 lb', 'With clamp and safety cable allowance', ''],
      ['Point-source speaker', 'Audio and video', '48 lb', '6 lb', '', ''],
    ])
  })

  it('when a metric venue opens its library, then the weights show in kilograms', async () => {
    vi.mocked(itemTypesApi.list).mockResolvedValue([
      { ...spot, unitWeight: 7.711064, allowancePerUnit: 1.133981, unitSystem: 'metric' },
    ])
    const w = await openLibrary('technical-director', { ...venue, unitSystem: 'metric' })
    // 17 lb = 7.711064 kg and 2.5 lb = 1.133981 kg (1 lb = 0.45359237 kg, NIST SP 811), shown to two places.
    expect(rows(w)[0]!.slice(2, 4)).toEqual(['7.71 kg', '1.13 kg'])
  })

  it('when a category is chosen, then only its types show', async () => {
    const w = await openLibrary('stage-manager')
    await w.get('[data-testid="item-types-category-audio-video"]').trigger('click')
    expect(rows(w).map((row) => row[0])).toEqual(['Point-source speaker'])
  })

  it('when a stage manager opens the library, then nothing offers to change it', async () => {
    const w = await openLibrary('stage-manager')
    expect(rows(w)).toHaveLength(2)
    for (const testid of ['item-types-add', 'item-type-edit', 'item-type-retire'])
      expect(w.find(`[data-testid="${testid}"]`).exists(), testid).toBe(false)
  })

  it('when a fly operator adds a type, then the body carries the figures in the venue units and it joins the list', async () => {
    const added: ItemType = { ...spot, id: 't3', name: 'Wash light', unitWeight: 22, allowancePerUnit: 3, notes: '' }
    vi.mocked(itemTypesApi.create).mockResolvedValue(added)
    const w = await openLibrary('fly-operator')
    await w.get('[data-testid="item-types-category-lighting"]').trigger('click')
    await w.get('[data-testid="item-types-add"]').trigger('click')
    await flushPromises()
    typeInto('item-type-name', 'Wash light')
    typeInto('item-type-unit-weight', '22')
    typeInto('item-type-allowance', '3')
    press('item-type-save')
    await flushPromises()
    expect(itemTypesApi.create).toHaveBeenCalledWith({
      name: 'Wash light',
      category: 'lighting',
      unitWeight: 22,
      allowancePerUnit: 3,
      notes: '',
      unitSystem: 'imperial',
    })
    expect(rows(w).map((row) => row[0])).toEqual(['Ellipsoidal spot, 26°', 'Wash light'])
  })

  it('when the form is sent without a weight, then the field says so and nothing is sent', async () => {
    const w = await openLibrary('administrator')
    await w.get('[data-testid="item-types-category-lighting"]').trigger('click')
    await w.get('[data-testid="item-types-add"]').trigger('click')
    await flushPromises()
    typeInto('item-type-name', 'Wash light')
    press('item-type-save')
    await flushPromises()
    expect(messagesUnder('item-type-unit-weight')).toBe('Weight of one unit is required')
    expect(itemTypesApi.create).not.toHaveBeenCalled()
  })

  it('when the server refuses a field, then its message shows under that field and the dialog stays open', async () => {
    vi.mocked(itemTypesApi.update).mockRejectedValue(
      new ApiError(409, 'duplicate', 'The library already has an item named "Point-source speaker"', {
        name: 'Already in use',
      }),
    )
    const w = await openLibrary('technical-director')
    await w.findAll('[data-testid="item-type-edit"]')[0]!.trigger('click')
    await flushPromises()
    typeInto('item-type-name', 'Point-source speaker')
    press('item-type-save')
    await flushPromises()
    expect(messagesUnder('item-type-name')).toBe('Already in use')
    expect(document.querySelector('[data-testid="item-type-dialog"]')).not.toBeNull()
    expect(w.find('[data-testid="item-types-stale"]').exists()).toBe(false)
  })

  it('when someone else changed the type first, then the page says so and reads the library again', async () => {
    vi.mocked(itemTypesApi.update).mockRejectedValue(new ApiError(409, 'stale_version', 'Changed elsewhere'))
    const w = await openLibrary('technical-director')
    await w.findAll('[data-testid="item-type-edit"]')[0]!.trigger('click')
    await flushPromises()
    const readsBefore = vi.mocked(itemTypesApi.list).mock.calls.length
    press('item-type-save')
    await flushPromises()
    expect(vi.mocked(itemTypesApi.update).mock.calls[0]).toEqual([
      't1',
      {
        name: 'Ellipsoidal spot, 26°',
        category: 'lighting',
        unitWeight: 17,
        allowancePerUnit: 2.5,
        notes: 'With clamp and safety cable allowance',
        unitSystem: 'imperial',
        version: 4,
      },
    ])
    expect(w.get('[data-testid="item-types-stale"]').text()).toContain('Someone else changed that item type')
    expect(vi.mocked(itemTypesApi.list).mock.calls.length).toBe(readsBefore + 1)
  })

  it('when a type is retired, then the page asks first and retires it only once confirmed', async () => {
    vi.mocked(itemTypesApi.retire).mockResolvedValue(undefined)
    const w = await openLibrary('fly-operator')
    await w.findAll('[data-testid="item-type-retire"]')[0]!.trigger('click')
    await flushPromises()
    expect(document.querySelector('[data-testid="item-type-retire-dialog"]')?.textContent).toContain(
      'Ellipsoidal spot, 26° leaves the library',
    )
    expect(itemTypesApi.retire).not.toHaveBeenCalled()
    press('item-type-retire-dialog-confirm')
    await flushPromises()
    expect(itemTypesApi.retire).toHaveBeenCalledWith('t1')
    expect(rows(w).map((row) => row[0])).toEqual(['Point-source speaker'])
  })

  it('when the retirement is called off, then nothing is retired', async () => {
    const w = await openLibrary('fly-operator')
    await w.findAll('[data-testid="item-type-retire"]')[0]!.trigger('click')
    await flushPromises()
    press('item-type-retire-dialog-keep')
    await flushPromises()
    expect(itemTypesApi.retire).not.toHaveBeenCalled()
    expect(rows(w)).toHaveLength(2)
  })
})
