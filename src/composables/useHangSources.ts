import { computed, ref } from 'vue'
import type { LibraryWeights } from '../../shared/hang/hang-items.js'
import type { HangRevision, HangSummary, ItemType, Production } from '../../shared/schemas/index.js'
import { hangsApi } from '../api/hangs'
import { itemTypesApi } from '../api/item-types'
import { productionsApi } from '../api/productions'
import { useAsyncTask } from './useAsyncTask'

/**
 * What the hang editor opens with: the lineset's latest saved revision (none before its first hang), the
 * venue's item library and its productions, read together.
 */
export function useHangSources(linesetId: () => string) {
  const reading = useAsyncTask()
  const latest = ref<HangRevision | null>(null)
  const itemTypes = ref<ItemType[]>([])
  const productions = ref<Production[]>([])
  const loaded = ref(false)

  const library = computed(
    () =>
      new Map<string, LibraryWeights>(
        itemTypes.value.map((type) => [
          type.id,
          { unitWeight: type.unitWeight, allowancePerUnit: type.allowancePerUnit },
        ]),
      ),
  )

  /** Reads everything; resolves to the latest revision (null for a first hang), or undefined when reading failed. */
  function read() {
    return reading.run(async () => {
      const id = linesetId()
      const [revisions, types, shows] = await Promise.all([
        hangsApi.list(id),
        itemTypesApi.list(),
        productionsApi.list(),
      ])
      const newest = revisions[0]
      latest.value = newest ? await hangsApi.read(id, newest.id) : null
      itemTypes.value = types
      productions.value = shows
      loaded.value = true
      return latest.value
    })
  }

  /** The newest revision's summary as the server has it now (after a 409, to say who saved it). */
  const newestSummary = async (): Promise<HangSummary | null> => (await hangsApi.list(linesetId()))[0] ?? null

  return { reading, latest, itemTypes, productions, library, loaded, read, newestSummary }
}
