import { defineStore } from 'pinia'
import { ref } from 'vue'
import type { TicketState, TicketView } from '../../shared/schemas/index.js'
import { ticketsApi } from '../api/tickets'

/** The venue's change tickets as last read, and each ticket opened, kept fresh after every move. */
export const useTicketsStore = defineStore('tickets', () => {
  const items = ref<TicketView[]>([])
  const loaded = ref(false)
  const filter = ref<TicketState | null>(null)

  function remember(ticket: TicketView) {
    const at = items.value.findIndex((item) => item.id === ticket.id)
    if (at !== -1) items.value.splice(at, 1, ticket)
    return ticket
  }

  async function load(state: TicketState | null = filter.value) {
    filter.value = state
    items.value = await ticketsApi.list(state ?? undefined)
    loaded.value = true
  }

  const read = async (id: string) => remember(await ticketsApi.get(id))

  return { items, loaded, filter, load, read, remember }
})
