import { ref } from 'vue'
import type { BrickStockLine } from '../../shared/schemas/index.js'
import { brickStockApi } from '../api/brick-stock'
import { useAsyncTask } from './useAsyncTask'

/** The venue's bricks by where they are, read for the bricks page. */
export function useBrickStock() {
  const lines = ref<BrickStockLine[]>([])
  const loading = useAsyncTask()
  async function load() {
    const found = await loading.run(() => brickStockApi.list())
    if (found) lines.value = found
  }
  return { lines, loading, load }
}
