import { computed, ref } from 'vue'
import type { Lineset, LinesetInput } from '../../shared/schemas/index.js'
import { useLinesetsStore } from '../stores/linesets'
import { useAsyncTask } from './useAsyncTask'

/**
 * One lineset on its page: reading it, saving it with the version it was read at, and removing it.
 * `formKey` changes whenever a fresh copy arrives, so the form starts again from the server's figures.
 */
export function useLinesetRecord(id: () => string | undefined) {
  const store = useLinesetsStore()
  const lineset = ref<Lineset | null>(null)
  const reads = ref(0)
  const reading = useAsyncTask()
  const saving = useAsyncTask()
  const removing = useAsyncTask()

  /** Reads the lineset again; for a new one, starts the form again from blank. */
  async function read() {
    const current = id()
    if (!current) {
      saving.error.value = null
      reads.value += 1
      return
    }
    const found = await reading.run(() => store.loadOne(current))
    if (found) {
      lineset.value = found
      saving.error.value = null
      reads.value += 1
    }
  }

  /** Creates or updates; answers the saved lineset, or undefined when the server refused (see `saving.error`). */
  async function save(body: LinesetInput) {
    const current = lineset.value
    const saved = await saving.run(() =>
      current ? store.update(current.id, { ...body, version: current.version }) : store.create(body),
    )
    if (saved) {
      lineset.value = saved
      reads.value += 1
    }
    return saved
  }

  const remove = async () => {
    const current = lineset.value
    if (!current) return false
    await removing.run(() => store.remove(current.id))
    return !removing.error.value
  }

  const formKey = computed(() => `${lineset.value?.id ?? 'new'}:${reads.value}`)
  return { lineset, formKey, reading, saving, removing, read, save, remove }
}
