import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import type { Role } from '../../shared/schemas/index.js'
import { ApiError } from '../../src/api/errors'
import { arborsApi } from '../../src/api/arbors'
import { brickTypesApi } from '../../src/api/brick-types'
import { linesetsApi } from '../../src/api/linesets'
import LinesetEditView from '../../src/views/LinesetEditView.vue'
import { testRouter } from './router'
import { useSessionStore } from '../../src/stores/session'
import { useVenueStore } from '../../src/stores/venue'
import { mountWithApp } from './mount'
import { linesetDetail as lineset, personWith, venue } from './fixtures'

vi.mock('../../src/api/linesets', () => ({
  linesetsApi: { list: vi.fn(), read: vi.fn(), create: vi.fn(), update: vi.fn(), remove: vi.fn() },
}))
// The page's hang editor reads the venue's bricks, the lineset's hangs, the library and the productions; a lineset
// with no hang yet and an empty venue are enough for these tests.
vi.mock('../../src/api/brick-types', () => ({
  brickTypesApi: { list: vi.fn(async () => []), create: vi.fn(), update: vi.fn(), remove: vi.fn() },
}))
vi.mock('../../src/api/hangs', () => ({ hangsApi: { list: vi.fn(async () => []), read: vi.fn(), save: vi.fn() } }))
vi.mock('../../src/api/item-types', () => ({ itemTypesApi: { list: vi.fn(async () => []) } }))
vi.mock('../../src/api/productions', () => ({ productionsApi: { list: vi.fn(async () => []) } }))

// The page's arbor panel reads what the arbor holds; empty here.
vi.mock('../../src/api/arbors', () => ({
  arborsApi: {
    read: vi.fn(async () => ({ linesetId: 'x', bricks: [], version: 0 })),
    count: vi.fn(),
    lockOut: vi.fn(),
    release: vi.fn(),
  },
}))

// The page's attachments panel lists none.
vi.mock('../../src/api/attachments', () => ({
  attachmentsApi: {
    list: vi.fn(async () => []),
    upload: vi.fn(),
    remove: vi.fn(),
    contentUrl: vi.fn(),
    thumbnailUrl: vi.fn(),
  },
}))

let wrapper: VueWrapper | undefined
beforeEach(() => vi.mocked(linesetsApi.read).mockResolvedValue(lineset()))
afterEach(() => {
  wrapper?.unmount()
  vi.clearAllMocks()
})

async function openLineset(role: Role, options: { attachTo?: HTMLElement } = {}) {
  const pinia = createPinia()
  setActivePinia(pinia)
  useSessionStore().user = personWith(role)
  useVenueStore().venue = venue
  const router = testRouter()
  await router.push(`/linesets/${lineset().id}`)
  wrapper = mountWithApp(LinesetEditView, {
    props: { id: lineset().id },
    global: { plugins: [pinia, router] },
    ...options,
  })
  await flushPromises()
  return wrapper
}

const save = async (w: VueWrapper) => {
  await w.get('[data-testid="lineset-form"]').trigger('submit')
  await flushPromises()
}

describe('LinesetEditView', () => {
  it('when a stage manager opens a lineset, then it reads as a detail page with no way to change or delete it', async () => {
    const w = await openLineset('stage-manager')
    expect(w.get('[data-testid="page-title"]').text()).toBe('Lineset 12 · Main drape')
    expect(w.find('[data-testid="lineset-read-only"]').exists()).toBe(true)
    for (const testid of ['lineset-save', 'lineset-delete', 'lineset-add-pick-point'])
      expect(w.find(`[data-testid="${testid}"]`).exists(), testid).toBe(false)
    // Once: beside the hang editor's figures, not repeated below it.
    expect(w.findAll('[data-testid="app-cautions"]')).toHaveLength(1)
    expect(w.findAll('[data-testid="app-caution"]').length).toBeGreaterThan(5)
    expect(w.get('[data-testid="app-figures-disclaimer"]').text()).toContain('assist a qualified person')
    expect(w.get('[data-testid="app-figures-disclaimer"]').text()).toContain('manufacturer’s ratings')
  })

  it('when someone presses "The hang", then the page scrolls to the hang editor and the focus lands on it', async () => {
    // jsdom does not scroll; the call and the focus are what the page does.
    const scrolled = vi.fn()
    Element.prototype.scrollIntoView = scrolled
    const w = await openLineset('fly-operator', { attachTo: document.body })
    await w.get('[data-testid="lineset-go-to-hang"]').trigger('click')
    const editor = w.get('[data-testid="hang-editor"]').element
    expect(scrolled.mock.contexts).toEqual([editor])
    expect(document.activeElement).toBe(editor)
  })

  it('when a technical director opens a lineset, then it can be saved but not deleted', async () => {
    const w = await openLineset('technical-director')
    expect(w.find('[data-testid="lineset-save"]').exists()).toBe(true)
    expect(w.find('[data-testid="lineset-delete"]').exists()).toBe(false)
  })

  it('when the lineset is saved, then the version it was read at goes with it', async () => {
    vi.mocked(linesetsApi.update).mockResolvedValue(lineset({ version: 4 }))
    const w = await openLineset('administrator')
    expect(w.get('[data-testid="lineset-delete"]').text()).toBe('Retire')
    await save(w)
    const [id, body] = vi.mocked(linesetsApi.update).mock.calls[0] ?? []
    expect(id).toBe(lineset().id)
    expect(body).toMatchObject({ version: 3, number: 12, pickPoints: [5, 15, 25, 35] })
  })

  it('when someone else saved first, then the page says so and Reload brings the newer copy', async () => {
    vi.mocked(linesetsApi.update).mockRejectedValue(new ApiError(409, 'stale_version', 'Changed by someone else'))
    const w = await openLineset('technical-director')
    await save(w)
    expect(w.get('[data-testid="lineset-stale"]').text()).toContain('Someone else changed this lineset')
    vi.mocked(linesetsApi.read).mockResolvedValue(lineset({ version: 5, name: 'Main drape (rehung)' }))
    await w.get('[data-testid="lineset-reload"]').trigger('click')
    await flushPromises()
    expect(w.find('[data-testid="lineset-stale"]').exists()).toBe(false)
    expect((w.get('[data-testid="lineset-field-name"] input').element as HTMLInputElement).value).toBe(
      'Main drape (rehung)',
    )
  })

  it('when the server refuses a field, then its message shows under that field', async () => {
    vi.mocked(linesetsApi.update).mockRejectedValue(
      new ApiError(400, 'validation_failed', 'Check this field: pickPoints.3', {
        'pickPoints.3': 'Too near the batten end',
      }),
    )
    const w = await openLineset('technical-director')
    await save(w)
    expect(w.get('[data-testid="lineset-pick-point-3"]').find('.v-messages').text()).toBe('Too near the batten end')
    expect(w.get('[data-testid="lineset-problem"]').text()).toBe('The server refused some fields; each one says why.')
  })
})

describe('LinesetEditView: the brick plan against the arbor panel', () => {
  it('when the arbor panel has read the arbor, then the hang figures show what it holds now beside what it should hold', async () => {
    const full = {
      id: 'b1',
      name: 'Full steel',
      material: 'Steel',
      unitWeight: 20,
      thickness: 2,
      quantityOwned: 400,
      version: 1,
      unitSystem: 'imperial' as const,
    }
    vi.mocked(brickTypesApi.list).mockResolvedValueOnce([full])
    vi.mocked(arborsApi.read).mockResolvedValueOnce({
      linesetId: lineset().id,
      bricks: [{ brickTypeId: full.id, name: full.name, count: 3 }],
      version: 0,
    })
    const w = await openLineset('fly-operator')
    await flushPromises()
    expect(w.text()).toContain('The arbor should hold')
    expect(w.get('[data-testid="balance-hold-Full steel"]').text()).toMatch(/^holds 3 now: /)
    expect(w.get('[data-testid="balance-arbor-moves"]').text()).not.toContain('move only the difference')
    expect(w.find('[data-testid="app-cautions"]').exists()).toBe(true)
  })
})
