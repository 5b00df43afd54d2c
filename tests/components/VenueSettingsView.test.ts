import { afterEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import { venueApi } from '../../src/api/venue'
import { useVenueStore } from '../../src/stores/venue'
import VenueSettingsView from '../../src/views/VenueSettingsView.vue'
import { mountWithApp } from './mount'
import { venue } from './fixtures'

vi.mock('../../src/api/venue', () => ({ venueApi: { read: vi.fn(), update: vi.fn() } }))

let wrapper: VueWrapper | undefined
afterEach(() => {
  wrapper?.unmount()
  vi.clearAllMocks()
})

function openSettings() {
  const pinia = createPinia()
  setActivePinia(pinia)
  useVenueStore().venue = { ...venue, balanceTolerance: 10 }
  wrapper = mountWithApp(VenueSettingsView, { global: { plugins: [pinia] } })
  return wrapper
}

const shown = (w: VueWrapper, testid: string) =>
  (w.get(`[data-testid="${testid}"] input`).element as HTMLInputElement).value
const choose = async (w: VueWrapper, system: string) => {
  await w.get(`[data-testid="venue-unit-system"] input[value="${system}"]`).setValue(true)
  await flushPromises()
}

describe('VenueSettingsView', () => {
  it('when the units switch to metric and back, then the policies keep their meaning and come home unchanged', async () => {
    const w = openSettings()
    await choose(w, 'metric')
    // 10 lb and 50 lb in kilograms (1 lb = 0.45359237 kg, NIST SP 811), shown to two places.
    expect(shown(w, 'venue-balance-tolerance')).toBe('4.54')
    expect(shown(w, 'venue-rope-lock-holding')).toBe('22.68')
    await choose(w, 'imperial')
    expect(shown(w, 'venue-balance-tolerance')).toBe('10')
    expect(shown(w, 'venue-rope-lock-holding')).toBe('50')
  })

  it('when metric is saved, then the exact converted policies are sent, not their rounding', async () => {
    vi.mocked(venueApi.update).mockImplementation(async (body) => ({ ...venue, ...body, version: 2 }))
    const w = openSettings()
    await choose(w, 'metric')
    await w.get('[data-testid="venue-form"]').trigger('submit')
    await flushPromises()
    const [body] = vi.mocked(venueApi.update).mock.calls[0] ?? []
    expect(body).toMatchObject({
      unitSystem: 'metric',
      balanceTolerance: 4.5359237,
      ropeLockHolding: 22.6796185,
      version: 1,
    })
  })
})
