import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import type { HangRevision } from '../../shared/schemas/index.js'
import { brickTypesApi } from '../../src/api/brick-types'
import { ApiError } from '../../src/api/errors'
import { hangsApi } from '../../src/api/hangs'
import { itemTypesApi } from '../../src/api/item-types'
import { productionsApi } from '../../src/api/productions'
import {
  BRICKS,
  PLANNED,
  REVISION_3,
  RUNNING,
  SPOT,
  TWO_LINES,
  WASH,
  choose,
  field,
  openEditor,
  type,
} from './hangEditorSetup'

vi.mock('../../src/api/brick-types', () => ({
  brickTypesApi: { list: vi.fn(), create: vi.fn(), update: vi.fn(), remove: vi.fn() },
}))
vi.mock('../../src/api/hangs', () => ({ hangsApi: { list: vi.fn(), read: vi.fn(), save: vi.fn() } }))
vi.mock('../../src/api/item-types', () => ({ itemTypesApi: { list: vi.fn() } }))
vi.mock('../../src/api/productions', () => ({ productionsApi: { list: vi.fn() } }))

const REVISION_4: HangRevision = {
  ...REVISION_3,
  id: '4a000000-0000-4000-8000-000000000004',
  revision: 4,
  title: 'First electric, with booms',
  createdAt: '2026-03-05T10:00:00.000Z',
  createdBy: { id: 'p2', name: 'Alex Gallery' },
}

let wrapper: VueWrapper | undefined
beforeEach(() => {
  vi.mocked(brickTypesApi.list).mockClear().mockResolvedValue(BRICKS)
  vi.mocked(hangsApi.list)
    .mockReset()
    .mockResolvedValue([{ ...REVISION_3 }])
  vi.mocked(hangsApi.read).mockReset().mockResolvedValue(REVISION_3)
  vi.mocked(hangsApi.save).mockReset()
  vi.mocked(itemTypesApi.list).mockReset().mockResolvedValue([WASH, SPOT])
  vi.mocked(productionsApi.list).mockReset().mockResolvedValue([RUNNING, PLANNED])
})
afterEach(() => {
  wrapper?.unmount()
  vi.clearAllMocks()
})

/** Opens revision 3 and adds two spotlights at the centre, as a fly operator would before saving. */
async function editRevision3(role: Parameters<typeof openEditor>[1] = 'fly-operator') {
  const w = (wrapper = await openEditor(TWO_LINES, role))
  await w.get('[data-testid="hang-add-lighting"]').trigger('click')
  await choose(w, 'hang-row-2-itemTypeId', SPOT.id)
  await type(w, 2, 'quantity', '2')
  await type(w, 2, 'at', '20')
  return w
}
const save = async (w: VueWrapper, testid = 'hang-save') => {
  await w.get(`[data-testid="${testid}"]`).trigger('click')
  await flushPromises()
}

describe('HangEditor, saving', () => {
  it('when a fly operator saves, then the body is the typed entries on the revision loaded, with no result', async () => {
    vi.mocked(hangsApi.save).mockResolvedValue({ ...REVISION_4, title: 'First electric, with specials' })
    const w = await editRevision3()
    await w.get('[data-testid="hang-title"] input').setValue('First electric, with specials')
    await choose(w, 'hang-production', PLANNED.id)
    await save(w)
    expect(hangsApi.save).toHaveBeenCalledTimes(1)
    const [linesetId, body] = vi.mocked(hangsApi.save).mock.calls[0]!
    expect(linesetId).toBe(TWO_LINES.id)
    expect(body).toEqual({
      title: 'First electric, with specials',
      productionId: PLANNED.id,
      basedOnRevision: 3,
      unitSystem: 'imperial',
      items: [
        ...REVISION_3.items,
        { label: 'Ellipsoidal spotlight', category: 'lighting', itemTypeId: SPOT.id, quantity: 2, at: 20 },
      ],
    })
    expect(body).not.toHaveProperty('result')
    expect(w.get('[data-testid="hang-revision"]').text()).toBe('Revision 4, saved by Alex Gallery on 5 Mar 2026')
    expect(w.find('[data-testid="hang-unsaved"]').exists()).toBe(false)
  })

  it('when a row does not read, then nothing is sent and the row says what it needs', async () => {
    const w = await editRevision3()
    await type(w, 2, 'at', '')
    await save(w)
    expect(hangsApi.save).not.toHaveBeenCalled()
    expect(w.get('[data-testid="hang-save-blocked"]').text()).toContain('each marked field says what it needs')
    expect(w.get('[data-testid="hang-row-2-messages"]').text()).toContain('Give a point, or a stretch')
  })

  it('when the server refuses fields, then each message shows at its row and field', async () => {
    vi.mocked(hangsApi.save).mockRejectedValue(
      new ApiError(400, 'validation_failed', 'Check these fields: items.2.itemTypeId, title', {
        'items.2.itemTypeId': 'That item type has been retired',
        title: 'Title is too long',
      }),
    )
    const w = await editRevision3()
    await save(w)
    expect(w.get('[data-testid="hang-row-2-messages"]').text()).toBe('Item: That item type has been retired')
    expect(field(w, 2, 'itemTypeId').classes()).toContain('v-input--error')
    expect(w.find('[data-testid="hang-row-0-messages"]').exists()).toBe(false)
    expect(w.get('[data-testid="hang-title"]').text()).toContain('Title is too long')
    // Editing the row clears what the server said of it.
    await type(w, 2, 'quantity', '3')
    expect(w.find('[data-testid="hang-row-2-messages"]').exists()).toBe(false)
  })

  it('when someone saved a newer revision meanwhile, then the typed items stay, compare is offered, and saving on top is explicit', async () => {
    vi.mocked(hangsApi.save).mockRejectedValueOnce(
      new ApiError(409, 'stale_revision', 'Revision 4 was saved since you started; compare with it and save again', {
        basedOnRevision: 'The latest is revision 4',
      }),
    )
    const w = await editRevision3()
    vi.mocked(hangsApi.list).mockResolvedValue([{ ...REVISION_4 }, { ...REVISION_3 }])
    await save(w)
    expect(w.get('[data-testid="hang-stale"]').text()).toContain('Revision 4 was saved meanwhile by Alex Gallery')
    expect(field(w, 2, 'quantity').get('input').element).toHaveProperty('value', '2')
    expect(w.findAll('[data-testid^="hang-row-"][data-testid$="-label"]')).toHaveLength(3)
    expect(w.get('[data-testid="hang-compare"]').attributes('href')).toBe(
      `/linesets/${TWO_LINES.id}/history?left=3&right=4`,
    )
    expect(w.get('[data-testid="hang-save"]').attributes()).toHaveProperty('disabled')

    vi.mocked(hangsApi.save).mockResolvedValueOnce({ ...REVISION_4, id: 'r5', revision: 5 })
    await save(w, 'hang-save-on-latest')
    expect(vi.mocked(hangsApi.save).mock.calls[1]![1].basedOnRevision).toBe(4)
    expect(vi.mocked(hangsApi.save).mock.calls[1]![1].items).toHaveLength(3)
    expect(w.find('[data-testid="hang-stale"]').exists()).toBe(false)
    expect(w.get('[data-testid="hang-revision"]').text()).toContain('Revision 5')
  })

  it('when someone saved a newer revision meanwhile and the person drops their own, then the latest opens', async () => {
    vi.mocked(hangsApi.save).mockRejectedValueOnce(
      new ApiError(409, 'stale_revision', 'Revision 4 was saved since you started', {
        basedOnRevision: 'The latest is revision 4',
      }),
    )
    const w = await editRevision3()
    vi.mocked(hangsApi.list).mockResolvedValue([{ ...REVISION_4 }, { ...REVISION_3 }])
    vi.mocked(hangsApi.read).mockResolvedValue(REVISION_4)
    await save(w)
    await w.get('[data-testid="hang-open-latest"]').trigger('click')
    await flushPromises()
    await vi.waitFor(() => expect(document.querySelector('[data-testid="hang-discard-dialog-confirm"]')).not.toBeNull())
    ;(document.querySelector('[data-testid="hang-discard-dialog-confirm"]') as HTMLElement).click()
    await flushPromises()
    expect(hangsApi.read).toHaveBeenLastCalledWith(TWO_LINES.id, REVISION_4.id)
    expect(w.get('[data-testid="hang-revision"]').text()).toBe('Revision 4, saved by Alex Gallery on 5 Mar 2026')
    expect(w.findAll('[data-testid^="hang-row-"][data-testid$="-label"]')).toHaveLength(2)
    expect(w.find('[data-testid="hang-stale"]').exists()).toBe(false)
    expect(w.get('[data-testid="hang-save"]').attributes()).not.toHaveProperty('disabled')
  })

  it('when the person leaves with the hang unsaved, then the app asks first and stays if told to', async () => {
    const w = await editRevision3()
    const router = (w.vm as unknown as { $router: import('vue-router').Router }).$router
    const confirm = vi.spyOn(window, 'confirm').mockReturnValue(false)
    await router.push('/bricks')
    expect(confirm).toHaveBeenCalledWith('Leave without saving this hang?')
    expect(router.currentRoute.value.path).toBe('/editor-under-test')
    confirm.mockReturnValue(true)
    await router.push('/bricks')
    expect(router.currentRoute.value.path).toBe('/bricks')
    confirm.mockRestore()
  })

  it('when a stage manager opens the hang, then it reads with no way to change or save it', async () => {
    const w = (wrapper = await openEditor(TWO_LINES, 'stage-manager'))
    expect(field(w, 0, 'label').get('input').element).toHaveProperty('value', 'Colour wash')
    expect(w.find('[data-testid="hang-save"]').exists()).toBe(false)
    expect(w.find('[data-testid="hang-add"]').exists()).toBe(false)
    expect(w.find('[data-testid="hang-row-0-remove"]').exists()).toBe(false)
    const inputs = w.findAll('[data-testid="hang-editor"] input:not([type="hidden"])')
    expect(inputs.length).toBeGreaterThan(5)
    for (const input of inputs) expect(input.attributes(), input.html()).toHaveProperty('readonly')
    expect(w.find('[data-testid="balance-line-loads"]').exists()).toBe(true)
  })
})
