import { getActivePinia, type Pinia, type PiniaPluginContext } from 'pinia'
import { setCsrfToken } from '../api/client'
import { forgetLoadingTicks } from '../composables/loadingTicks'

type Reset = () => void

// Per Pinia instance, how to put each store that has been used back to its first state.
const resetsByPinia = new WeakMap<Pinia, Map<string, Reset>>()

const copyOf = <T>(value: T): T => (value === undefined ? value : JSON.parse(JSON.stringify(value)))

/**
 * Pinia plugin: remembers every store's first state as the store is created, so signing out can forget
 * everything read for the person without a hand-kept list of stores that a new store could miss.
 */
export function forgetfulStores({ pinia, store }: PiniaPluginContext) {
  const first = copyOf(store.$state) as Record<string, unknown>
  const resets = resetsByPinia.get(pinia) ?? new Map<string, Reset>()
  resetsByPinia.set(pinia, resets)
  resets.set(store.$id, () =>
    store.$patch((state: Record<string, unknown>) => {
      for (const key of new Set([...Object.keys(state), ...Object.keys(first)])) state[key] = copyOf(first[key])
    }),
  )
}

/**
 * Drops everything read for the person who was signed in (every store, the API token and the loading ticks kept
 * on the tab), so the next person sees none of it.
 */
export function forgetSignedInData(pinia: Pinia | undefined = getActivePinia()) {
  if (pinia) for (const reset of resetsByPinia.get(pinia)?.values() ?? []) reset()
  setCsrfToken('')
  forgetLoadingTicks()
}
