import { afterEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { arborsApi } from '../../src/api/arbors'
import { ApiError } from '../../src/api/errors'
import LinesetLockoutPanel from '../../src/components/LinesetLockoutPanel.vue'
import { messagesUnder, press, typeInto } from './dialogFields'
import { mountWithApp } from './mount'

vi.mock('../../src/api/arbors', () => ({
  arborsApi: { read: vi.fn(), count: vi.fn(), lockOut: vi.fn(), release: vi.fn() },
}))

const ID = '2c6a8d10-0000-4000-8000-000000000012'
const lockout = { reason: 'Lift line frayed', at: '2026-12-01T19:30:00.000Z', by: { id: 'u1', name: 'Theo Lindqvist' } }

let wrapper: VueWrapper | undefined
afterEach(() => {
  wrapper?.unmount()
  vi.clearAllMocks()
})

const mountPanel = (props: { lockout: typeof lockout | null; editable: boolean }) =>
  (wrapper = mountWithApp(LinesetLockoutPanel, { props: { linesetId: ID, ...props } }))

describe('LinesetLockoutPanel', () => {
  it('when a set is locked out, then everyone reads why, who and since when, and only editors see Release', async () => {
    const w = mountPanel({ lockout, editable: false })
    expect(w.get('[data-testid="lockout-current"]').text()).toMatch(
      /Locked out, do not operate\. Lift line frayed.*Theo Lindqvist/s,
    )
    expect(w.find('[data-testid="lockout-release"]').exists()).toBe(false)
    expect(w.find('[data-testid="lockout-lock"]').exists()).toBe(false)
  })

  it('when a technical director locks the set out with a reason, then it is sent and the panel shows the lock-out', async () => {
    vi.mocked(arborsApi.lockOut).mockResolvedValue(lockout)
    const w = mountPanel({ lockout: null, editable: true })
    await w.get('[data-testid="lockout-reason"] input').setValue('Lift line frayed')
    await w.get('form').trigger('submit')
    await flushPromises()
    expect(arborsApi.lockOut).toHaveBeenCalledWith(ID, { reason: 'Lift line frayed' })
    expect(w.get('[data-testid="lockout-current"]').text()).toContain('Lift line frayed')
    expect(w.emitted('changed')).toEqual([[lockout]])
  })

  it('when the server refuses the reason, then its message shows', async () => {
    vi.mocked(arborsApi.lockOut).mockRejectedValue(
      new ApiError(400, 'validation_failed', 'Check this field: reason', { reason: 'Reason must not be empty' }),
    )
    const w = mountPanel({ lockout: null, editable: true })
    await w.get('form').trigger('submit')
    await flushPromises()
    expect(w.get('[data-testid="lockout-error"]').text()).toBe('Reason must not be empty')
  })

  it('when Release is pressed, then nothing is sent until the release is confirmed with what was checked', async () => {
    vi.mocked(arborsApi.release).mockResolvedValue(undefined)
    const w = mountPanel({ lockout, editable: true })
    await w.get('[data-testid="lockout-release"]').trigger('click')
    await flushPromises()
    expect(document.querySelector('[data-testid="lockout-release-dialog"]')?.textContent).toContain('Lift line frayed')
    expect(arborsApi.release).not.toHaveBeenCalled()
    typeInto('lockout-release-reason', 'Lift line replaced and trimmed')
    press('lockout-release-confirm')
    await flushPromises()
    expect(arborsApi.release).toHaveBeenCalledWith(ID, { reason: 'Lift line replaced and trimmed' })
    expect(w.get('[data-testid="lockout-none"]').text()).toBe('This lineset is not locked out.')
    expect(w.emitted('changed')).toEqual([[null]])
  })

  it('when the release is cancelled, then the set stays locked out and nothing is sent', async () => {
    const w = mountPanel({ lockout, editable: true })
    await w.get('[data-testid="lockout-release"]').trigger('click')
    await flushPromises()
    const cancel = [
      ...document.querySelectorAll<HTMLButtonElement>('[data-testid="lockout-release-dialog"] button'),
    ].find((button) => button.textContent?.trim() === 'Cancel')
    cancel!.click()
    await flushPromises()
    expect(arborsApi.release).not.toHaveBeenCalled()
    expect(w.get('[data-testid="lockout-current"]').text()).toContain('Lift line frayed')
    expect(w.emitted('changed')).toBeUndefined()
  })

  it('when the server refuses a release without a reason, then its words show under the field and the set stays locked out', async () => {
    vi.mocked(arborsApi.release).mockRejectedValue(
      new ApiError(400, 'validation_failed', 'Check this field', {
        reason: 'What was checked or fixed must not be empty',
      }),
    )
    const w = mountPanel({ lockout, editable: true })
    await w.get('[data-testid="lockout-release"]').trigger('click')
    await flushPromises()
    press('lockout-release-confirm')
    await flushPromises()
    expect(arborsApi.release).toHaveBeenCalledWith(ID, { reason: '' })
    expect(messagesUnder('lockout-release-reason')).toBe('What was checked or fixed must not be empty')
    expect(w.get('[data-testid="lockout-current"]').text()).toContain('Lift line frayed')
    expect(w.emitted('changed')).toBeUndefined()
    typeInto('lockout-release-reason', 'Lift line replaced')
    await flushPromises()
    expect(messagesUnder('lockout-release-reason')).toBe("Kept in the lineset's history with the lock-out")
  })
})
