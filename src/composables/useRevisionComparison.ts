import { computed, ref, shallowRef, watch } from 'vue'
import { compareRevisions } from '../../shared/hang/hang-comparison.js'
import type { HangRevision, HangSummary } from '../../shared/schemas/index.js'
import type { UnitSystem } from '../../shared/units/index.js'
import { hangsApi } from '../api/hangs'
import { itemTypesApi } from '../api/item-types'
import { chooseRevisions } from './revisionChoice'
import { useAsyncTask } from './useAsyncTask'

/**
 * A lineset's saved revisions and the comparison of two of them: `load` reads the list (and the library's names,
 * so a change of item type reads by name); the two the page's query names (`left`, `right`; by default the
 * latest and the one before it) are read once each and compared in the venue's units.
 */
export function useRevisionComparison(
  linesetId: () => string,
  query: () => { left?: unknown; right?: unknown },
  units: () => UnitSystem,
) {
  const summaries = ref<HangSummary[]>([])
  const loaded = ref(false)
  const revisions = shallowRef<ReadonlyMap<number, HangRevision>>(new Map())
  const itemTypeNames = shallowRef<ReadonlyMap<string, string>>(new Map())
  const listing = useAsyncTask()
  const reading = useAsyncTask()
  const choice = computed(() =>
    chooseRevisions(
      summaries.value.map((summary) => summary.revision),
      query(),
    ),
  )
  const chosen = () => choice.value

  async function load() {
    // Revisions are kept by number, which only means something within one lineset.
    revisions.value = new Map()
    loaded.value = false
    const list = await listing.run(() => hangsApi.list(linesetId()))
    if (!list) return
    summaries.value = list
    loaded.value = true
    // Names only make changes of item type readable; without them the comparison still stands.
    const types = await itemTypesApi.list().catch(() => [])
    itemTypeNames.value = new Map(types.map((type) => [type.id, type.name]))
  }

  async function readRevision(revision: number | null) {
    if (revision === null || revisions.value.has(revision)) return
    const summary = summaries.value.find((entry) => entry.revision === revision)
    if (!summary) return
    const found = await reading.run(() => hangsApi.read(linesetId(), summary.id))
    if (found) revisions.value = new Map(revisions.value).set(revision, found)
  }

  watch(
    () => [loaded.value, chosen().left, chosen().right] as const,
    async ([ready, left, right]) => {
      if (!ready) return
      await readRevision(right)
      await readRevision(left)
    },
    { immediate: true },
  )

  const left = computed(() => revisions.value.get(chosen().left ?? 0) ?? null)
  const right = computed(() => revisions.value.get(chosen().right ?? 0) ?? null)
  const comparison = computed(() =>
    left.value && right.value ? compareRevisions(left.value, right.value, units(), itemTypeNames.value) : null,
  )

  return { summaries, loaded, listing, reading, choice, left, right, comparison, load }
}
