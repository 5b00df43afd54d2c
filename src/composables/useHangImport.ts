import { computed, reactive, ref, type Ref } from 'vue'
import { MAX_ITEMS } from '../../shared/schemas/calculation.js'
import type { CsvReading } from '../../shared/paperwork/csv-read.js'
import { guessMapping, readImportRows, type ColumnMapping } from '../../shared/paperwork/hang-import.js'
import type { ItemCategory, ItemType, Lineset } from '../../shared/schemas/index.js'
import { hangsApi } from '../api/hangs'
import { errorMessage } from '../api/errors'

/**
 * The state of one import: the mapping (guessed from the header, then the person's), weights typed for
 * unmatched items, the rows read by the shared rules, and the commit, all or nothing, as a new revision.
 */
export function useHangImport(lineset: () => Lineset, library: () => ItemType[], reading: Ref<CsvReading | null>) {
  const mapping = ref<ColumnMapping>({})
  const defaultCategory = ref<ItemCategory>('lighting')
  const weights = reactive(new Map<number, number>())
  const title = ref('')
  const committing = ref(false)
  const problem = ref<string | null>(null)

  function start(fileName: string) {
    mapping.value = reading.value ? guessMapping(reading.value.header, lineset().unitSystem) : {}
    weights.clear()
    title.value = `Imported from ${fileName}`.slice(0, 120)
    problem.value = null
  }

  const rows = computed(() =>
    reading.value
      ? readImportRows(reading.value.header, reading.value.rows, mapping.value, {
          units: lineset().unitSystem,
          library: library(),
          defaultCategory: defaultCategory.value,
          weights,
        })
      : [],
  )
  const wrong = computed(() => rows.value.filter((row) => row.errors.length))
  const blocker = computed(() => {
    if (!rows.value.length) return 'The file has no rows to import'
    if (mapping.value.label === undefined && mapping.value.item === undefined)
      return 'Choose the column with the labels'
    if (wrong.value.length) return `${wrong.value.length} rows need fixing first`
    if (rows.value.length > MAX_ITEMS)
      return `A hang holds at most ${MAX_ITEMS} items; the file has ${rows.value.length}`
    return null
  })

  /** Saves every row as the lineset's next revision, on top of the latest; nothing is saved while a row is wrong. */
  async function commit() {
    if (blocker.value) return null
    committing.value = true
    problem.value = null
    try {
      const [latest] = await hangsApi.list(lineset().id)
      return await hangsApi.save(lineset().id, {
        title: title.value,
        basedOnRevision: latest?.revision ?? null,
        items: rows.value.map((row) => row.entry!),
        unitSystem: lineset().unitSystem,
      })
    } catch (error) {
      problem.value = errorMessage(error)
      return null
    } finally {
      committing.value = false
    }
  }

  return { mapping, defaultCategory, weights, title, rows, wrong, blocker, committing, problem, start, commit }
}
