import { describe, expect, it } from 'vitest'
import { OPERATING_STATUSES, OPERATING_STATUS_LOOK } from '../../shared/schemas/operating-status.js'
import AppOperatingStatusChip from '../../src/components/AppOperatingStatusChip.vue'
import { mountWithApp } from './mount'

describe('the operating status chip', () => {
  it.each(OPERATING_STATUSES)(
    'when the status is %s, then its full words are in the chip and nothing clips them',
    (status) => {
      const wrapper = mountWithApp(AppOperatingStatusChip, { props: { status, size: 'large' } })
      const chip = wrapper.get(`[data-testid=operating-${status}]`).element as HTMLElement
      expect(chip.textContent?.trim()).toBe(OPERATING_STATUS_LOOK[status].label)
      const style = getComputedStyle(chip)
      expect(style.whiteSpace).toBe('normal')
      expect(style.textOverflow).not.toBe('ellipsis')
      expect(style.overflow).toBe('visible')
      expect(style.height).toBe('auto')
      expect(chip.className).not.toMatch(/text-truncate|text-no-wrap/)
      wrapper.unmount()
    },
  )

  it('when a lineset is out of balance, then the chip says so in full, down to "do not operate"', () => {
    const wrapper = mountWithApp(AppOperatingStatusChip, { props: { status: 'out-of-balance' } })
    expect(wrapper.text()).toBe('Out of balance, do not operate')
    wrapper.unmount()
  })
})
