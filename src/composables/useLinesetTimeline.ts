import { ref } from 'vue'
import type { LinesetEventView } from '../../shared/schemas/index.js'
import { linesetsApi } from '../api/linesets'
import { useAsyncTask } from './useAsyncTask'

/** How many entries one page of the timeline asks for. */
export const TIMELINE_PAGE_SIZE = 20

/**
 * A lineset's timeline, newest first, a page at a time: `load` reads the first page, `loadOlder` the next one
 * after the last entry shown (the API's `next` cursor), until `next` is null.
 */
export function useLinesetTimeline(linesetId: () => string) {
  const events = ref<LinesetEventView[]>([])
  const next = ref<string | null>(null)
  const loaded = ref(false)
  const reading = useAsyncTask()

  async function load() {
    const page = await reading.run(() => linesetsApi.events(linesetId(), { limit: TIMELINE_PAGE_SIZE }))
    if (!page) return
    events.value = page.events
    next.value = page.next
    loaded.value = true
  }

  async function loadOlder() {
    const before = next.value
    if (!before || reading.running.value) return
    const page = await reading.run(() => linesetsApi.events(linesetId(), { limit: TIMELINE_PAGE_SIZE, before }))
    if (!page) return
    // An entry already shown (the ledger only grows at the newest end) is never listed twice.
    const shown = new Set(events.value.map((event) => event.id))
    events.value = [...events.value, ...page.events.filter((event) => !shown.has(event.id))]
    next.value = page.next
  }

  return { events, next, loaded, reading, load, loadOlder }
}
