import { ref } from 'vue'
import type { ArborContents } from '../../shared/schemas/index.js'
import { arborsApi } from '../api/arbors'
import { useAsyncTask } from './useAsyncTask'

/** One arbor's contents on the lineset page: reading them, and recording a count with the version read. */
export function useArborContents(linesetId: () => string) {
  const contents = ref<ArborContents | null>(null)
  const reading = useAsyncTask()
  const saving = useAsyncTask()

  async function read() {
    const found = await reading.run(() => arborsApi.read(linesetId()))
    if (found) contents.value = found
  }

  /** Records a count taken at the rail; answers true once saved. A stale copy is read again. */
  async function record(counts: Record<string, number>, note: string) {
    const current = contents.value
    if (!current) return false
    const bricks = Object.entries(counts).map(([brickTypeId, count]) => ({ brickTypeId, count }))
    const saved = await saving.run(() =>
      arborsApi.count(linesetId(), { version: current.version, bricks, ...(note.trim() ? { note } : {}) }),
    )
    if (saved) contents.value = saved
    else if (saving.error.value?.code === 'stale_version') await read()
    return !!saved
  }

  return { contents, reading, saving, read, record }
}
