import { ref, type Ref } from 'vue'
import { useAsyncTask } from './useAsyncTask'

/**
 * A row action that asks first (delete, retire, remove): which row is asked about, whether the question shows,
 * and the action itself. On success the question closes; a refusal that means the row moved under it (`movedCodes`)
 * closes it too and `onMoved` says why, while any other keeps it open showing the error.
 *
 * @example
 * const removal = useConfirmedAction((brick: BrickType) => store.remove(brick.id))
 * removal.ask(brick) // then the dialog's confirm calls removal.confirm()
 */
export function useConfirmedAction<Item>(
  act: (item: Item) => Promise<unknown>,
  hooks: {
    onDone?: () => Promise<unknown>
    movedCodes?: readonly string[]
    onMoved?: (code: string) => Promise<unknown>
  } = {},
) {
  const target = ref(null) as Ref<Item | null>
  const open = ref(false)
  const task = useAsyncTask()

  function ask(item: Item) {
    target.value = item
    task.error.value = null
    open.value = true
  }

  async function confirm() {
    const item = target.value
    if (!item) return
    await task.run(() => act(item))
    const code = task.error.value?.code
    if (!code) {
      open.value = false
      await hooks.onDone?.()
    } else if (hooks.movedCodes?.includes(code)) {
      open.value = false
      await hooks.onMoved?.(code)
    }
  }

  return { target, open, task, ask, confirm }
}
