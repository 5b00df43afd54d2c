import { ref } from 'vue'
import { toApiError, type ApiError } from '../api/errors'

/**
 * The state of one request a view waits on: whether it runs, and what went wrong.
 * The error is kept whole so a view can tell a stale copy (409) from a refusal.
 */
export function useAsyncTask() {
  const running = ref(false)
  const error = ref<ApiError | null>(null)

  async function run<T>(task: () => Promise<T>): Promise<T | undefined> {
    running.value = true
    error.value = null
    try {
      return await task()
    } catch (thrown) {
      error.value = toApiError(thrown)
      return undefined
    } finally {
      running.value = false
    }
  }

  return { running, error, run }
}
