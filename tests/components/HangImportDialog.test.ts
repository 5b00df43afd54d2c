import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { readCsvText } from '../../shared/paperwork/csv-read.js'
import type { HangRevision } from '../../shared/schemas/index.js'
import { hangsApi } from '../../src/api/hangs'
import { itemTypesApi } from '../../src/api/item-types'
import HangImportDialog from '../../src/components/HangImportDialog.vue'
import type { CsvFileReader } from '../../src/composables/useCsvFileReader'
import { lineset } from './fixtures'
import { SPOT, WASH } from './hangEditorSetup'
import { mountWithApp } from './mount'

vi.mock('../../src/api/hangs', () => ({ hangsApi: { list: vi.fn(), read: vi.fn(), save: vi.fn() } }))
vi.mock('../../src/api/item-types', () => ({ itemTypesApi: { list: vi.fn() } }))

// Invented test data: a lighting list with a fixture the library lacks and a position that is not a number.
const LIST = ['Unit,Fixture,Position (ft),Qty', '1,LED wash,4,2', '2,Moving head,10,1', '', '3,led wash,x,1'].join(
  '\r\n',
)

// jsdom has no Worker: the same shared reading runs here, on the test's thread, with its progress.
const reader: CsvFileReader = async (file, onProgress) => readCsvText(await file.text(), onProgress)

let wrapper: VueWrapper | undefined
beforeEach(() => {
  vi.mocked(itemTypesApi.list).mockReset().mockResolvedValue([WASH, SPOT])
  vi.mocked(hangsApi.list).mockReset().mockResolvedValue([])
  vi.mocked(hangsApi.save)
    .mockReset()
    .mockResolvedValue({ id: 'h1', revision: 1 } as HangRevision)
})
afterEach(() => wrapper?.unmount())

const body = () => document.body
const byTestId = (id: string) => body().querySelector(`[data-testid="${id}"]`)

async function chooseFile(text: string) {
  const input = body().querySelector<HTMLInputElement>('[data-testid="hang-import-file"] input[type="file"]')!
  const file = new File([text], 'electrics.csv', { type: 'text/csv' })
  Object.defineProperty(input, 'files', { value: [file], configurable: true })
  input.dispatchEvent(new Event('change'))
  await vi.waitFor(() => expect(byTestId('hang-import-preview')).not.toBeNull())
}

describe('the hang import dialog', () => {
  it('when a lighting list is chosen, then each row is previewed and a wrong one says which column is wrong', async () => {
    wrapper = mountWithApp(HangImportDialog, { props: { modelValue: true, lineset: lineset(), reader } })
    await flushPromises()
    await chooseFile(LIST)
    expect(byTestId('hang-import-summary')!.textContent).toContain('3 rows read, 2 to fix.')
    expect(byTestId('hang-import-row-5')!.textContent).toContain('Position (ft): “x” is not a number')
    expect(byTestId('hang-import-row-3')!.textContent).toContain(
      'Fixture: “Moving head” is not in the item library; give its weight',
    )
    expect(byTestId('hang-import-row-2')!.textContent).toContain('from the library')
    expect(byTestId('hang-import-commit')!.hasAttribute('disabled')).toBe(true)
    expect(byTestId('hang-import-blocker')!.textContent).toContain('2 rows need fixing first')
  })

  it('when every row is put right, then all of them are saved as the next revision, in one save', async () => {
    vi.mocked(hangsApi.list).mockResolvedValue([{ revision: 3 } as HangRevision])
    wrapper = mountWithApp(HangImportDialog, { props: { modelValue: true, lineset: lineset(), reader } })
    await flushPromises()
    await chooseFile(LIST.replace('led wash,x', 'led wash,30'))
    const weight = body().querySelector<HTMLInputElement>('[data-testid="hang-import-weight-3"] input')!
    weight.value = '38'
    weight.dispatchEvent(new Event('input'))
    await vi.waitFor(() => expect(byTestId('hang-import-commit')!.hasAttribute('disabled')).toBe(false))
    ;(byTestId('hang-import-commit') as HTMLButtonElement).click()
    await vi.waitFor(() => expect(hangsApi.save).toHaveBeenCalledTimes(1))
    const [linesetId, saved] = vi.mocked(hangsApi.save).mock.calls[0]!
    expect(linesetId).toBe(lineset().id)
    expect(saved).toMatchObject({ title: 'Imported from electrics.csv', basedOnRevision: 3 })
    expect(saved.items).toEqual([
      { label: '1', category: 'lighting', itemTypeId: WASH.id, quantity: 2, at: 4 },
      { label: '2', category: 'lighting', weight: 38, at: 10, quantity: 1 },
      { label: '3', category: 'lighting', itemTypeId: WASH.id, quantity: 1, at: 30 },
    ])
    await vi.waitFor(() => expect(wrapper!.emitted('imported')).toHaveLength(1))
  })

  it('when a file is over the size limit, then it is refused in words and nothing is previewed', async () => {
    const refusing: CsvFileReader = async () => readCsvText('x'.repeat(6 * 1024 * 1024))
    wrapper = mountWithApp(HangImportDialog, { props: { modelValue: true, lineset: lineset(), reader: refusing } })
    await flushPromises()
    const input = body().querySelector<HTMLInputElement>('[data-testid="hang-import-file"] input[type="file"]')!
    Object.defineProperty(input, 'files', { value: [new File(['a'], 'huge.csv')], configurable: true })
    input.dispatchEvent(new Event('change'))
    await vi.waitFor(() => expect(byTestId('hang-import-refusal')!.textContent).toContain('reads at most 5 MB'))
    expect(byTestId('hang-import-preview')).toBeNull()
  })
})
