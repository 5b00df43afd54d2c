import { defineStore } from 'pinia'
import { ref } from 'vue'
import type { Lineset, LinesetInput, LinesetUpdate } from '../../shared/schemas/index.js'
import { linesetsApi } from '../api/linesets'

/** The venue's linesets as last read, kept in step with every change made from this browser. */
export const useLinesetsStore = defineStore('linesets', () => {
  const items = ref<Lineset[]>([])
  const loaded = ref(false)

  function remember(lineset: Lineset) {
    const at = items.value.findIndex((item) => item.id === lineset.id)
    if (at === -1) items.value.push(lineset)
    else items.value.splice(at, 1, lineset)
    return lineset
  }

  async function loadAll() {
    items.value = await linesetsApi.list()
    loaded.value = true
  }

  const loadOne = async (id: string) => remember(await linesetsApi.read(id))
  const create = async (body: LinesetInput) => remember(await linesetsApi.create(body))
  const update = async (id: string, body: LinesetUpdate) => remember(await linesetsApi.update(id, body))

  async function remove(id: string) {
    await linesetsApi.remove(id)
    items.value = items.value.filter((item) => item.id !== id)
  }

  return { items, loaded, loadAll, loadOne, create, update, remove }
})
