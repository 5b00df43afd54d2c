import { computed, ref, watch, type Ref } from 'vue'
import type { Check } from '../../shared/schemas/calculation-result.js'
import { hangsApi } from '../api/hangs'
import { useAsyncTask } from './useAsyncTask'

/**
 * What the engine found on a saved hang revision when it was saved: its findings that say stop or look again,
 * read from the revision itself. A change whose hang says stop cannot be asked for or approved (the server
 * refuses both); screens use this to say so before anyone presses.
 */
export function useHangFindings(revision: Ref<{ linesetId: string; hangId: string } | null>) {
  const checks = ref<Check[]>([])
  const reading = useAsyncTask()
  watch(
    () => (revision.value ? `${revision.value.linesetId}/${revision.value.hangId}` : null),
    async () => {
      checks.value = []
      const wanted = revision.value
      if (!wanted) return
      const saved = await reading.run(() => hangsApi.read(wanted.linesetId, wanted.hangId))
      if (saved && revision.value?.hangId === wanted.hangId)
        checks.value = saved.result.checks.filter((check) => check.level !== 'info')
    },
    { immediate: true },
  )
  const stops = computed(() => checks.value.filter((check) => check.level === 'danger'))
  return { checks, stops, reading }
}
