import { defineStore } from 'pinia'
import { ref } from 'vue'
import type { BrickType, BrickTypeInput, BrickTypeUpdate } from '../../shared/schemas/index.js'
import { brickTypesApi } from '../api/brick-types'

/** The kinds of brick the house owns and how many of each. */
export const useBrickTypesStore = defineStore('brickTypes', () => {
  const items = ref<BrickType[]>([])
  const loaded = ref(false)

  function remember(brickType: BrickType) {
    const at = items.value.findIndex((item) => item.id === brickType.id)
    if (at === -1) items.value.push(brickType)
    else items.value.splice(at, 1, brickType)
    return brickType
  }

  async function loadAll() {
    items.value = await brickTypesApi.list()
    loaded.value = true
  }

  const create = async (body: BrickTypeInput) => remember(await brickTypesApi.create(body))
  const update = async (id: string, body: BrickTypeUpdate) => remember(await brickTypesApi.update(id, body))

  async function remove(id: string) {
    await brickTypesApi.remove(id)
    items.value = items.value.filter((item) => item.id !== id)
  }

  return { items, loaded, loadAll, create, update, remove }
})
