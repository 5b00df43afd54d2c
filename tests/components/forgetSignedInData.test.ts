import { createPinia, setActivePinia } from 'pinia'
import { describe, expect, it } from 'vitest'
import { createApp } from 'vue'
import { hasCsrfToken, setCsrfToken } from '../../src/api/client'
import { forgetfulStores, forgetSignedInData } from '../../src/stores/forget'

// Every store the client has, found by file, so a store added later is covered without editing this test.
const storeModules = import.meta.glob<Record<string, unknown>>('../../src/stores/*.ts', { eager: true })
type AnyStore = { $id: string; $state: Record<string, unknown> }
const storeFactories = Object.values(storeModules).flatMap((module) =>
  Object.entries(module)
    .filter(([name, value]) => /^use\w+Store$/.test(name) && typeof value === 'function')
    .map(([, value]) => value as () => AnyStore),
)

describe('signing out forgets everything', () => {
  it('when someone signs out, then no store holds data read for them and the API token is gone', () => {
    const pinia = createPinia()
    pinia.use(forgetfulStores)
    createApp({}).use(pinia) // Pinia applies plugins once it is installed in an app, as in the client
    setActivePinia(pinia)
    expect(storeFactories.length).toBeGreaterThanOrEqual(5)
    const stores = storeFactories.map((useStore) => useStore())
    const first = stores.map((store) => JSON.parse(JSON.stringify(store.$state)))

    // Fill every piece of state with something read for the signed-in person.
    for (const store of stores)
      for (const key of Object.keys(store.$state)) {
        const value = store.$state[key]
        store.$state[key] = Array.isArray(value)
          ? [{ id: 'held' }]
          : typeof value === 'boolean'
            ? !value
            : { id: 'held' }
      }
    setCsrfToken('token-of-the-person')
    expect(stores.every((store, index) => JSON.stringify(store.$state) !== JSON.stringify(first[index]))).toBe(true)

    forgetSignedInData(pinia)

    stores.forEach((store, index) =>
      expect({ id: store.$id, state: store.$state }).toEqual({ id: store.$id, state: first[index] }),
    )
    expect(hasCsrfToken()).toBe(false)
  })
})
