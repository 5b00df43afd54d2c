import { computed, toValue, type MaybeRefOrGetter } from 'vue'
import { positionsBeyondBatten } from '../../shared/hang/entry-bounds.js'
import {
  expandHangEntries,
  loadCount,
  type EngineItem,
  type HangEntry,
  type LibraryWeights,
} from '../../shared/hang/hang-items.js'
import { fieldsFromIssues } from '../../shared/errors/fields.js'
import { MAX_ITEMS } from '../../shared/schemas/calculation.js'
import { hangEntrySchemaFor } from '../../shared/schemas/index.js'
import type { UnitSystem } from '../../shared/units/index.js'
import { entryDraftFrom } from './hangRowEntries'
import { isBlankRow, type HangRow } from './hangRows'

const loadWeight = (load: EngineItem) => ('weight' in load ? load.weight : load.weightPerLength * (load.to - load.from))

/** Messages for one row: by the entry's field (`at`, `fabric.height`, `points.1`, ...) or for the row (`row`). */
export type RowMessages = Record<string, string>

interface Sources {
  rows: MaybeRefOrGetter<readonly HangRow[]>
  units: MaybeRefOrGetter<UnitSystem>
  battenLength: MaybeRefOrGetter<number>
  library: MaybeRefOrGetter<ReadonlyMap<string, LibraryWeights>>
}

/**
 * The typed rows read as the save body's entries by the shared schema, checked against the batten, and expanded
 * with the library into the engine's loads by `expandHangEntries`: the same code the server runs on a save, so
 * the live figures are the ones the saved revision will hold. Blank rows are left out.
 */
export function useHangEntries(sources: Sources) {
  const counted = computed(() => toValue(sources.rows).filter((row) => !isBlankRow(row)))
  // A keystroke changes one row; the others keep what the schema said of them (a figure's checks are not free, and
  // 250 rows are read on every keystroke). Keyed by the draft as text, so any change to a row reads it again.
  type Outcome = ReturnType<ReturnType<typeof hangEntrySchemaFor>['safeParse']>
  const readBefore = new Map<number, { key: string; outcome: Outcome }>()
  const parsed = computed(() => {
    const units = toValue(sources.units)
    const schema = hangEntrySchemaFor(units)
    const seen = new Set<number>()
    const read = counted.value.map((row) => {
      seen.add(row.id)
      const draft = entryDraftFrom(row)
      const key = `${units} ${JSON.stringify(draft, (_, value) => (Number.isNaN(value) ? 'NaN' : value))}`
      const before = readBefore.get(row.id)
      if (before?.key === key) return { row, outcome: before.outcome }
      const outcome = schema.safeParse(draft)
      readBefore.set(row.id, { key, outcome })
      return { row, outcome }
    })
    for (const id of readBefore.keys()) if (!seen.has(id)) readBefore.delete(id)
    return read
  })
  /** The entries to save, or null while any row does not read. */
  const entries = computed<HangEntry[] | null>(() =>
    parsed.value.every(({ outcome }) => outcome.success)
      ? parsed.value.map(({ outcome }) => outcome.data as HangEntry)
      : null,
  )
  const expansion = computed(() =>
    entries.value
      ? expandHangEntries(entries.value, toValue(sources.library), toValue(sources.units), MAX_ITEMS)
      : null,
  )

  const messages = computed(() => {
    const byRow: Record<number, RowMessages> = {}
    const put = (row: HangRow | undefined, field: string, message: string) => {
      if (row) (byRow[row.id] ??= {})[field] ??= message
    }
    // Each row that reads is checked against the batten on its own, so a stretch past the end shows while
    // another row still holds a typo.
    const readable: Array<{ row: HangRow; entry: HangEntry }> = []
    for (const { row, outcome } of parsed.value) {
      if (outcome.success) readable.push({ row, entry: outcome.data as HangEntry })
      else for (const [path, message] of Object.entries(fieldsFromIssues(outcome.error.issues))) put(row, path, message)
    }
    const bounds = positionsBeyondBatten(
      readable.map(({ entry }) => entry),
      toValue(sources.battenLength),
    )
    for (const { index, field, message } of bounds) put(readable[index]?.row, field, message)
    if (expansion.value && !expansion.value.ok)
      for (const { index, field, message } of expansion.value.problems) put(counted.value[index], field, message)
    return byRow
  })

  /** What stops the list as a whole (too many loads), not any one row. */
  const listProblems = computed(() =>
    expansion.value && !expansion.value.ok
      ? expansion.value.problems.filter((problem) => problem.index < 0).map((problem) => problem.message)
      : [],
  )

  /** The engine's loads, or null while any row is wrong. */
  const items = computed<EngineItem[] | null>(() =>
    expansion.value?.ok && Object.keys(messages.value).length === 0 ? expansion.value.items : null,
  )

  /** Which counted row each engine load came from, so an engine message lands on its row. */
  const owners = computed(() =>
    (entries.value ?? []).flatMap((entry, index) => Array<number>(loadCount(entry)).fill(counted.value[index]!.id)),
  )

  /** What each readable row puts on the batten in all, by row id, so a person can check it against the piece. */
  const rowWeights = computed(() => {
    const weights = new Map<number, number>()
    const library = toValue(sources.library)
    const units = toValue(sources.units)
    for (const { row, outcome } of parsed.value) {
      if (!outcome.success) continue
      const expanded = expandHangEntries([outcome.data as HangEntry], library, units, MAX_ITEMS)
      if (expanded.ok)
        weights.set(
          row.id,
          expanded.items.reduce((sum, load) => sum + loadWeight(load), 0),
        )
    }
    return weights
  })

  return { counted, entries, items, messages, listProblems, owners, rowWeights }
}
