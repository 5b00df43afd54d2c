import { onBeforeUnmount, onMounted, ref } from 'vue'

/**
 * Asks before work is lost: leaving the page in the app (call `mayLeave` from a route guard) or closing
 * or reloading the tab (the browser's own prompt) while `changed` is true.
 */
export function useUnsavedGuard(question: string) {
  const changed = ref(false)

  function mayLeave(): boolean {
    return !changed.value || window.confirm(question)
  }

  const onBeforeUnload = (event: BeforeUnloadEvent) => {
    if (!changed.value) return
    event.preventDefault()
    event.returnValue = '' // some browsers still need it to show their prompt
  }
  onMounted(() => window.addEventListener('beforeunload', onBeforeUnload))
  onBeforeUnmount(() => window.removeEventListener('beforeunload', onBeforeUnload))

  return { changed, mayLeave }
}
