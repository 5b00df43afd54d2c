import { defineStore } from 'pinia'
import { ref } from 'vue'
import type { Production, ProductionInput, ProductionUpdate } from '../../shared/schemas/index.js'
import { productionsApi } from '../api/productions'

/** The venue's productions, the shows its hangs are grouped by. */
export const useProductionsStore = defineStore('productions', () => {
  const items = ref<Production[]>([])
  const loaded = ref(false)

  function remember(production: Production) {
    const at = items.value.findIndex((item) => item.id === production.id)
    if (at === -1) items.value.push(production)
    else items.value.splice(at, 1, production)
    return production
  }

  async function loadAll() {
    items.value = await productionsApi.list()
    loaded.value = true
  }

  const create = async (body: ProductionInput) => remember(await productionsApi.create(body))
  const update = async (id: string, body: ProductionUpdate) => remember(await productionsApi.update(id, body))

  return { items, loaded, loadAll, create, update }
})
