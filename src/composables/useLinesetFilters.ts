import { computed, ref, type Ref } from 'vue'
import type { Lineset, LinesetKind, LinesetStatus } from '../../shared/schemas/index.js'
import { KIND_LABELS } from './linesetLabels'

/** The list's filters: free text over number, name, kind and notes, plus chosen kinds and statuses. */
export function useLinesetFilters(linesets: Ref<readonly Lineset[]>) {
  const text = ref('')
  const kinds = ref<LinesetKind[]>([])
  const statuses = ref<LinesetStatus[]>([])

  const shown = computed(() => {
    const words = text.value.trim().toLowerCase().split(/\s+/).filter(Boolean)
    return linesets.value.filter((lineset) => {
      if (kinds.value.length && !kinds.value.includes(lineset.kind)) return false
      if (statuses.value.length && !statuses.value.includes(lineset.status)) return false
      const haystack = [lineset.number, lineset.name, KIND_LABELS[lineset.kind], lineset.notes ?? '']
        .join(' ')
        .toLowerCase()
      return words.every((word) => haystack.includes(word))
    })
  })

  const active = computed(() => !!text.value.trim() || kinds.value.length > 0 || statuses.value.length > 0)

  function reset() {
    text.value = ''
    kinds.value = []
    statuses.value = []
  }

  return { text, kinds, statuses, shown, active, reset }
}
