import { computed, inject, provide, ref, toValue, type InjectionKey, type MaybeRefOrGetter } from 'vue'
import type { BrickType, HangRevision, HangSummary, ItemCategory, Lineset, Venue } from '../../shared/schemas/index.js'
import { hangSaveSchemaFor } from '../../shared/schemas/index.js'
import { rowFromEntry } from './hangRowEntries'
import { emptyRow, type HangRow, type HangRowKind } from './hangRows'
import { useHangEntries, type RowMessages } from './useHangEntries'
import { useHangSave } from './useHangSave'
import { useHangSources } from './useHangSources'
import { useLiveBalance } from './useLiveBalance'

interface Sources {
  lineset: MaybeRefOrGetter<Lineset>
  venue: MaybeRefOrGetter<Venue | null>
  brickTypes: MaybeRefOrGetter<readonly BrickType[]>
}

/**
 * The hang editor's state: the revision it started from, the title, production and item rows as typed, the
 * live figures from the shared engine, and saving a new revision on top of the one loaded.
 */
export function useHangEditor(sources: Sources) {
  const lineset = () => toValue(sources.lineset)
  const units = computed(() => toValue(sources.venue)?.unitSystem ?? lineset().unitSystem)
  const options = useHangSources(() => lineset().id)
  const rows = ref<HangRow[]>([])
  const title = ref('')
  const productionId = ref<string | null>(null)
  /** The revision on screen: the one loaded, then each one saved from here. */
  const revision = ref<HangSummary | null>(null)
  const changed = ref(false)
  const attempted = ref(false)

  const entries = useHangEntries({ rows, units, battenLength: () => lineset().battenLength, library: options.library })
  const balance = useLiveBalance({ ...sources, items: entries.items })
  const saver = useHangSave(() => lineset().id, options.newestSummary)

  /** Every message a row shows: what it lacks as typed, what the engine says of its loads, what the server refused. */
  const rowMessages = computed(() => {
    const byRow: Record<number, RowMessages> = {}
    const put = (id: number | undefined, field: string, message: string) => {
      if (id !== undefined) (byRow[id] ??= {})[field] ??= message
    }
    for (const [id, messages] of Object.entries(entries.messages.value))
      for (const [field, message] of Object.entries(messages)) put(Number(id), field, message)
    for (const [path, message] of Object.entries(balance.fields.value)) {
      const load = /^items\.(\d+)/.exec(path)
      if (load) put(entries.owners.value[Number(load[1])], 'row', message)
    }
    for (const [id, messages] of Object.entries(saver.rowErrors.value))
      for (const [field, message] of Object.entries(messages)) put(Number(id), field, message)
    return byRow
  })

  const titleProblem = computed(() => {
    const read = hangSaveSchemaFor(units.value).shape.title.safeParse(title.value)
    if (!read.success && attempted.value) return read.error.issues[0]?.message ?? 'Give the hang a title'
    return saver.fieldErrors.value.title
  })
  const productionProblem = computed(() => saver.fieldErrors.value.productionId)
  /** Anything the typed items say before a save could go. */
  const itemsNeedWork = computed(
    () => Object.keys(entries.messages.value).length > 0 || entries.listProblems.value.length > 0,
  )

  function open(latest: HangRevision | null) {
    rows.value = latest ? latest.items.map(rowFromEntry) : []
    title.value = latest?.title ?? ''
    productionId.value = latest?.productionId ?? null
    revision.value = latest
    changed.value = false
    attempted.value = false
    saver.reset()
  }

  async function load() {
    const latest = await options.read()
    if (latest !== undefined) open(latest)
  }

  const touched = () => (changed.value = true)
  function add(category: ItemCategory, kind?: HangRowKind) {
    const row = emptyRow(category, kind)
    rows.value.push(row)
    touched()
    return row.id
  }
  function remove(id: number) {
    rows.value = rows.value.filter((row) => row.id !== id)
    touched()
  }
  /** Rows change only here, so the list that owns them is the one place they are written. */
  function update(id: number, patch: Partial<Omit<HangRow, 'id' | 'category'>>) {
    const row = rows.value.find((candidate) => candidate.id === id)
    if (!row) return
    Object.assign(row, patch)
    saver.forgetRow(id)
    touched()
  }
  function setTitle(text: string) {
    title.value = text
    touched()
  }
  function setProduction(id: string | null) {
    productionId.value = id
    touched()
  }

  /**
   * Saves a new revision based on the one loaded, or, when told to after a 409, on the latest one. Nothing is
   * sent while a row or the title is wrong: each says what it needs.
   */
  async function save(onTopOfLatest = false) {
    attempted.value = true
    const typed = entries.entries.value
    if (!typed || itemsNeedWork.value || titleProblem.value) return undefined
    const stale = saver.stale.value
    const basedOnRevision = onTopOfLatest && stale ? stale.latestRevision : (revision.value?.revision ?? null)
    const saved = await saver.save(
      { title: title.value.trim(), productionId: productionId.value, basedOnRevision, unitSystem: units.value },
      { entries: typed, rowIds: entries.counted.value.map((row) => row.id) },
    )
    if (saved) {
      revision.value = saved
      changed.value = false
      attempted.value = false
    }
    return saved
  }

  return {
    units,
    options,
    rows,
    title,
    productionId,
    revision,
    changed,
    attempted,
    entries,
    balance,
    rowMessages,
    titleProblem,
    productionProblem,
    itemsNeedWork,
    saving: saver.saving,
    stale: saver.stale,
    load,
    add,
    remove,
    update,
    setTitle,
    setProduction,
    save,
  }
}

export type HangEditor = ReturnType<typeof useHangEditor>

const editorKey: InjectionKey<HangEditor> = Symbol('hang-editor')

export const provideHangEditor = (editor: HangEditor) => provide(editorKey, editor)

/** The hang in the enclosing HangEditor; its parts read and write through it. */
export function useHangEditorContext(): HangEditor {
  const editor = inject(editorKey)
  if (!editor) throw new Error('A hang editor part must sit inside HangEditor')
  return editor
}
