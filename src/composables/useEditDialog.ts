import { ref, type Ref } from 'vue'
import { useAsyncTask } from './useAsyncTask'

/** A row that is changed with the version it was read at, so a stale copy is refused (409). */
interface Versioned {
  id: string
  version: number
}

interface EditDialogOptions<Body> {
  create: (body: Body) => Promise<unknown>
  update: (id: string, body: Body & { version: number }) => Promise<unknown>
  /** Error codes after which the copy on screen is out of date: the dialog closes and `onMoved` says why. */
  movedCodes: readonly string[]
  onMoved: (code: string) => Promise<unknown>
  onSaved?: () => Promise<unknown>
}

/**
 * The add-or-change dialog of a list page: which row it edits, whether it shows, and the save that creates or
 * updates with the row's version. A refusal the user can mend (a field message) keeps the dialog open; one that
 * means the list moved under it closes the dialog so the page can read the list again.
 *
 * @example
 * const dialog = useEditDialog<Production, ProductionInput>({ create, update, movedCodes: ['stale_version'], onMoved })
 * dialog.openFor(null) // add
 */
export function useEditDialog<Item extends Versioned, Body>(options: EditDialogOptions<Body>) {
  const editing = ref(null) as Ref<Item | null>
  const open = ref(false)
  const saving = useAsyncTask()

  function openFor(item: Item | null) {
    editing.value = item
    saving.error.value = null
    open.value = true
  }

  async function save(body: Body) {
    const current = editing.value
    const saved = await saving.run(() =>
      current ? options.update(current.id, { ...body, version: current.version }) : options.create(body),
    )
    const code = saving.error.value?.code
    if (saved) {
      open.value = false
      await options.onSaved?.()
    } else if (code && options.movedCodes.includes(code)) {
      open.value = false
      await options.onMoved(code)
    }
  }

  return { editing, open, saving, openFor, save }
}
