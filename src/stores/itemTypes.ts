import { defineStore } from 'pinia'
import { ref } from 'vue'
import type { ItemType, ItemTypeInput, ItemTypeUpdate } from '../../shared/schemas/index.js'
import { itemTypesApi } from '../api/item-types'

/** The venue's item library: the generic things the crew hangs again and again. */
export const useItemTypesStore = defineStore('itemTypes', () => {
  const items = ref<ItemType[]>([])
  const loaded = ref(false)

  function remember(itemType: ItemType) {
    const at = items.value.findIndex((item) => item.id === itemType.id)
    if (at === -1) items.value.push(itemType)
    else items.value.splice(at, 1, itemType)
    return itemType
  }

  async function loadAll() {
    items.value = await itemTypesApi.list()
    loaded.value = true
  }

  const create = async (body: ItemTypeInput) => remember(await itemTypesApi.create(body))
  const update = async (id: string, body: ItemTypeUpdate) => remember(await itemTypesApi.update(id, body))

  /** Takes a type out of the library; the list answers only types still in it, so it leaves the list here too. */
  async function retire(id: string) {
    await itemTypesApi.retire(id)
    items.value = items.value.filter((item) => item.id !== id)
  }

  return { items, loaded, loadAll, create, update, retire }
})
