import { defineStore } from 'pinia'
import { ref } from 'vue'
import type { Person, PersonUpdate } from '../../shared/schemas/index.js'
import { peopleApi } from '../api/people'

/** The members of the venue and their roles (administrators only); new ones come by invitation. */
export const usePeopleStore = defineStore('people', () => {
  const items = ref<Person[]>([])
  const loaded = ref(false)

  function remember(person: Person) {
    const at = items.value.findIndex((item) => item.id === person.id)
    if (at === -1) items.value.push(person)
    else items.value.splice(at, 1, person)
    return person
  }

  async function loadAll() {
    items.value = await peopleApi.list()
    loaded.value = true
  }

  const update = async (id: string, body: PersonUpdate) => remember(await peopleApi.update(id, body))

  async function remove(id: string) {
    await peopleApi.remove(id)
    items.value = items.value.filter((item) => item.id !== id)
  }

  return { items, loaded, loadAll, update, remove }
})
