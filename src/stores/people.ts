import { defineStore } from 'pinia'
import { ref } from 'vue'
import type { Person, PersonInput, PersonUpdate } from '../../shared/schemas/index.js'
import { peopleApi } from '../api/people'

/** The members of the venue and their roles (administrators only). */
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

  const add = async (body: PersonInput) => remember(await peopleApi.add(body))
  const update = async (id: string, body: PersonUpdate) => remember(await peopleApi.update(id, body))

  async function remove(id: string) {
    await peopleApi.remove(id)
    items.value = items.value.filter((item) => item.id !== id)
  }

  return { items, loaded, loadAll, add, update, remove }
})
