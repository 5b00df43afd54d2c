import { afterEach, describe, expect, it, vi } from 'vitest'
import { defineComponent, h } from 'vue'
import { mount } from '@vue/test-utils'
import { useUnsavedGuard } from '../../src/composables/useUnsavedGuard'

const mounted: Array<{ unmount(): void }> = []
function withGuard() {
  let guard!: ReturnType<typeof useUnsavedGuard>
  const wrapper = mount(defineComponent({ setup: () => ((guard = useUnsavedGuard('Leave?')), () => h('div')) }))
  mounted.push(wrapper)
  return { wrapper, guard }
}

afterEach(() => {
  vi.restoreAllMocks()
  for (const wrapper of mounted.splice(0)) wrapper.unmount()
})

describe('useUnsavedGuard', () => {
  it('when nothing changed, then leaving needs no question', () => {
    const confirm = vi.spyOn(window, 'confirm')
    const { guard } = withGuard()
    expect(guard.mayLeave()).toBe(true)
    expect(confirm).not.toHaveBeenCalled()
  })

  it('when something changed, then leaving asks, and the answer decides', () => {
    const confirm = vi.spyOn(window, 'confirm').mockReturnValueOnce(false).mockReturnValueOnce(true)
    const { guard } = withGuard()
    guard.changed.value = true
    expect(guard.mayLeave()).toBe(false)
    expect(guard.mayLeave()).toBe(true)
    expect(confirm).toHaveBeenCalledWith('Leave?')
  })

  it('when something changed, then closing the tab asks the browser to prompt, until the page is gone', () => {
    const { wrapper, guard } = withGuard()
    guard.changed.value = true
    const event = new Event('beforeunload', { cancelable: true })
    window.dispatchEvent(event)
    expect(event.defaultPrevented).toBe(true)
    wrapper.unmount()
    const after = new Event('beforeunload', { cancelable: true })
    window.dispatchEvent(after)
    expect(after.defaultPrevented).toBe(false)
  })
})
