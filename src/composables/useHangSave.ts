import { ref } from 'vue'
import type { HangEntry } from '../../shared/hang/hang-items.js'
import type { HangRevision, HangSave, HangSummary } from '../../shared/schemas/index.js'
import type { UnitSystem } from '../../shared/units/index.js'
import { hangsApi } from '../api/hangs'
import { useAsyncTask } from './useAsyncTask'
import type { RowMessages } from './useHangEntries'

/** Another revision was saved after the one the editor started from. */
export interface StaleBase {
  startedFrom: number | null
  latest: HangSummary | null
  latestRevision: number | null
}

/** The latest revision's number as a 409 `stale_revision` states it (`fields.basedOnRevision`). */
const revisionStated = (text: string | undefined) => {
  const found = /(\d+)/.exec(text ?? '')
  return found ? Number(found[1]) : null
}

/**
 * Saving a revision: the body the route takes (never a result: the server computes its own), a refusal's
 * fields placed on the rows they name, and a stale base kept for the person to compare or save on top of.
 */
export function useHangSave(linesetId: () => string, newestSummary: () => Promise<HangSummary | null>) {
  const saving = useAsyncTask()
  /** Server refusals by row id, and by field for the rest (`title`, `productionId`). */
  const rowErrors = ref<Record<number, RowMessages>>({})
  const fieldErrors = ref<Record<string, string>>({})
  const stale = ref<StaleBase | null>(null)

  function placeRefusal(fields: Record<string, string>, sentRowIds: readonly number[]) {
    const byRow: Record<number, RowMessages> = {}
    const other: Record<string, string> = {}
    for (const [path, message] of Object.entries(fields)) {
      const entry = /^items\.(\d+)(?:\.(.+))?$/.exec(path)
      const rowId = entry ? sentRowIds[Number(entry[1])] : undefined
      if (rowId !== undefined) (byRow[rowId] ??= {})[entry![2] ?? 'row'] = message
      else other[path] = message
    }
    rowErrors.value = byRow
    fieldErrors.value = other
  }

  async function noteStale(startedFrom: number | null, stated: string | undefined) {
    let latest: HangSummary | null = null
    try {
      latest = await newestSummary()
    } catch {
      // The number the refusal stated is enough to go on.
    }
    stale.value = { startedFrom, latest, latestRevision: latest?.revision ?? revisionStated(stated) }
  }

  /** Sends the save; resolves to the new revision, or undefined when refused (the reason kept for the screen). */
  async function save(
    body: { title: string; productionId: string | null; basedOnRevision: number | null; unitSystem: UnitSystem },
    entries: { entries: HangEntry[]; rowIds: readonly number[] },
  ): Promise<HangRevision | undefined> {
    const sent: HangSave = { ...body, items: entries.entries }
    const saved = await saving.run(() => hangsApi.save(linesetId(), sent))
    const error = saving.error.value
    if (saved) {
      rowErrors.value = {}
      fieldErrors.value = {}
      stale.value = null
    } else if (error?.code === 'validation_failed') placeRefusal(error.fields, entries.rowIds)
    else if (error?.code === 'stale_revision') await noteStale(body.basedOnRevision, error.fields.basedOnRevision)
    return saved
  }

  /** A row edited after a refusal: what the server said of it no longer holds. */
  function forgetRow(rowId: number) {
    if (rowErrors.value[rowId]) {
      const { [rowId]: _gone, ...rest } = rowErrors.value
      rowErrors.value = rest
    }
  }

  /** Another revision opened: nothing said of the earlier one holds. */
  function reset() {
    rowErrors.value = {}
    fieldErrors.value = {}
    stale.value = null
    saving.error.value = null
  }

  return { saving, rowErrors, fieldErrors, stale, save, forgetRow, reset }
}
