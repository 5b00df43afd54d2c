import { defineStore } from 'pinia'
import { ref } from 'vue'
import type { OutboxMessage, OutboxMessageSummary } from '../../shared/schemas/index.js'
import { outboxApi } from '../api/outbox'

/** How many messages one read of the outbox asks for. */
export const OUTBOX_PAGE = 50

/** The venue's outgoing mail and where each message stands (administrators only). */
export const useOutboxStore = defineStore('outbox', () => {
  const items = ref<OutboxMessageSummary[]>([])
  /** Messages opened so far, with their text, by id. */
  const opened = ref<Record<string, OutboxMessage>>({})
  const loaded = ref(false)
  const more = ref(false)

  /** Reads the newest page again (states move on while the page is open). */
  async function loadFirst() {
    const page = await outboxApi.list({ limit: OUTBOX_PAGE })
    items.value = page
    more.value = page.length === OUTBOX_PAGE
    loaded.value = true
  }

  async function loadMore() {
    const last = items.value.at(-1)
    if (!last) return loadFirst()
    const page = await outboxApi.list({ limit: OUTBOX_PAGE, before: last.id })
    items.value = [...items.value, ...page]
    more.value = page.length === OUTBOX_PAGE
  }

  async function open(id: string) {
    const message = await outboxApi.get(id)
    opened.value = { ...opened.value, [id]: message }
    return message
  }

  return { items, opened, loaded, more, loadFirst, loadMore, open }
})
