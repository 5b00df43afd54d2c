import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { createPinia, setActivePinia, type Pinia } from 'pinia'
import type { Attachment, Role } from '../../shared/schemas/index.js'
import { attachmentsApi } from '../../src/api/attachments'
import { ApiError } from '../../src/api/errors'
import LinesetAttachmentsPanel from '../../src/components/LinesetAttachmentsPanel.vue'
import { useSessionStore } from '../../src/stores/session'
import { personWith } from './fixtures'
import { mountWithApp } from './mount'

vi.mock('../../src/api/attachments', () => ({
  attachmentsApi: {
    list: vi.fn(),
    upload: vi.fn(),
    remove: vi.fn(),
    contentUrl: (id: string) => `/api/v1/attachments/${id}/content`,
    thumbnailUrl: (id: string) => `/api/v1/attachments/${id}/thumbnail`,
  },
}))

const LINESET = '2c6a8d10-0000-4000-8000-000000000012'
const me = personWith('fly-operator')
const attachment = (overrides: Partial<Attachment>): Attachment => ({
  id: 'a1',
  linesetId: LINESET,
  hangItemId: null,
  fileName: 'Scale ticket.pdf',
  contentType: 'application/pdf',
  byteSize: 245_760,
  sha256: 'f'.repeat(64),
  hasThumbnail: false,
  uploadedBy: { id: 'someone-else', name: 'Ines Okafor' },
  uploadedAt: '2026-12-01T19:30:00.000Z',
  ...overrides,
})
const photo = attachment({
  id: 'a2',
  fileName: 'Arbor after loading.jpg',
  contentType: 'image/jpeg',
  byteSize: 1_572_864,
  hasThumbnail: true,
  uploadedBy: { id: me.id, name: me.name },
})

let pinia: Pinia
let wrapper: VueWrapper | undefined
beforeEach(() => {
  pinia = createPinia()
  setActivePinia(pinia)
  vi.mocked(attachmentsApi.list).mockResolvedValue([photo, attachment({})])
})
afterEach(() => {
  wrapper?.unmount()
  vi.clearAllMocks()
})

async function mountAs(role: Role) {
  useSessionStore().signedInAs({ user: { ...me, role }, csrfToken: 't' })
  wrapper = mountWithApp(LinesetAttachmentsPanel, { props: { linesetId: LINESET }, global: { plugins: [pinia] } })
  await flushPromises()
  return wrapper
}

/** Chooses a file in the panel's picker, as the browser's file dialog would. */
async function choose(w: VueWrapper, file: File) {
  const input = w.get('[data-testid="attachments-file"]')
  Object.defineProperty(input.element, 'files', { value: [file], configurable: true })
  await input.trigger('change')
}

describe('LinesetAttachmentsPanel', () => {
  it('when attachments are listed, then each shows its name, kind and size, a thumbnail or an icon, and a download', async () => {
    const w = await mountAs('technical-director')
    const row = w.get('[data-testid="attachment-a2"]')
    expect(row.text()).toContain('Arbor after loading.jpg')
    expect(row.text()).toContain('JPEG photo · 1.5 MB')
    expect(row.html()).toContain('/api/v1/attachments/a2/thumbnail')
    expect(w.get('[data-testid="attachment-a1"]').text()).toContain('PDF document · 240 KB')
    expect(w.get('[data-testid="attachment-a1"]').find('.mdi-file-pdf-box').exists()).toBe(true)
    expect(w.get('[data-testid="attachment-download-a1"]').attributes('href')).toBe('/api/v1/attachments/a1/content')
  })

  it('when a stage manager reads, then there is no upload and no delete, only downloads', async () => {
    const w = await mountAs('stage-manager')
    expect(w.find('[data-testid="attachments-upload"]').exists()).toBe(false)
    expect(w.find('[data-testid="attachments-file"]').exists()).toBe(false)
    expect(w.find('[data-testid="attachment-delete-a1"]').exists()).toBe(false)
    expect(w.find('[data-testid="attachment-download-a1"]').exists()).toBe(true)
  })

  it('when a fly operator looks, then only what they uploaded offers a delete', async () => {
    const w = await mountAs('fly-operator')
    expect(w.find('[data-testid="attachment-delete-a2"]').exists()).toBe(true)
    expect(w.find('[data-testid="attachment-delete-a1"]').exists()).toBe(false)
  })

  it('when a file is chosen, then the progress bar follows the upload and the file joins the top of the list', async () => {
    let report: (sent: number) => void = () => {}
    let finish: (saved: Attachment) => void = () => {}
    vi.mocked(attachmentsApi.upload).mockImplementation((_id, _file, onProgress) => {
      report = onProgress
      return new Promise((resolve) => (finish = resolve))
    })
    const w = await mountAs('fly-operator')
    await choose(w, new File([new Uint8Array(2048)], 'Batten photo.png', { type: 'image/png' }))
    expect(vi.mocked(attachmentsApi.upload).mock.calls[0]?.[0]).toBe(LINESET)
    report(0.4)
    await flushPromises()
    const bar = w.get('[data-testid="attachments-progress"]')
    expect(bar.attributes('aria-valuenow')).toBe('40')
    finish(attachment({ id: 'a3', fileName: 'Batten photo.png', contentType: 'image/png', hasThumbnail: true }))
    await flushPromises()
    expect(w.find('[data-testid="attachments-progress"]').exists()).toBe(false)
    expect(w.findAll('[data-testid^="attachment-a"]')[0]!.text()).toContain('Batten photo.png')
  })

  it('when the server refuses a file by its content, then its words show', async () => {
    vi.mocked(attachmentsApi.upload).mockRejectedValue(
      new ApiError(415, 'unsupported_file_type', '“photo.png” is not a PNG image inside'),
    )
    const w = await mountAs('fly-operator')
    await choose(w, new File(['MZ'], 'photo.png'))
    await flushPromises()
    expect(w.get('[data-testid="attachments-upload-error"]').text()).toBe('“photo.png” is not a PNG image inside')
  })

  it('when a file is too large or of another kind, then it is refused in words before anything is sent', async () => {
    const w = await mountAs('fly-operator')
    await choose(w, new File(['x'], 'setup.exe'))
    await flushPromises()
    expect(w.get('[data-testid="attachments-upload-error"]').text()).toContain('Only photos')
    const big = new File(['x'], 'Huge.pdf')
    Object.defineProperty(big, 'size', { value: 11 * 1024 * 1024 })
    await choose(w, big)
    await flushPromises()
    expect(w.get('[data-testid="attachments-upload-error"]').text()).toBe(
      '“Huge.pdf” is 11 MB; the largest file is 10 MB',
    )
    expect(attachmentsApi.upload).not.toHaveBeenCalled()
  })

  it('when delete is pressed, then it asks first, and only a confirmation deletes', async () => {
    vi.mocked(attachmentsApi.remove).mockResolvedValue(undefined)
    const w = await mountAs('technical-director')
    await w.get('[data-testid="attachment-delete-a1"]').trigger('click')
    await flushPromises()
    const dialog = () => document.querySelector('[data-testid="attachment-delete-dialog"]')
    expect(dialog()?.textContent).toContain('“Scale ticket.pdf” is removed for everyone')
    expect(attachmentsApi.remove).not.toHaveBeenCalled()
    ;(document.querySelector('[data-testid="attachment-delete-dialog-confirm"]') as HTMLElement).click()
    await flushPromises()
    expect(attachmentsApi.remove).toHaveBeenCalledWith('a1')
    expect(w.find('[data-testid="attachment-a1"]').exists()).toBe(false)
  })
})
