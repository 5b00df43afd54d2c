import { defineStore } from 'pinia'
import { computed, ref } from 'vue'
import type {
  BoardLineset,
  LatestPreRunCheck,
  OperatingStatus,
  PreRunCheck,
  PreRunCheckInput,
} from '../../shared/schemas/index.js'
import type { UnitSystem } from '../../shared/units/index.js'
import { boardApi, preRunChecksApi } from '../api/board'

/** The board as last read: every lineset's status, kept fresh lineset by lineset as live events arrive. */
export const useBoardStore = defineStore('board', () => {
  const linesets = ref<BoardLineset[]>([])
  const unitSystem = ref<UnitSystem>('imperial')
  const lastCheck = ref<PreRunCheck | null>(null)
  const latest = ref<LatestPreRunCheck | null>(null)
  const productionId = ref<string | null>(null)
  const statusFilter = ref<OperatingStatus | null>(null)
  const loaded = ref(false)

  const shown = computed(() =>
    statusFilter.value ? linesets.value.filter((l) => l.operatingStatus === statusFilter.value) : linesets.value,
  )
  const readyCount = computed(() => linesets.value.filter((l) => l.operatingStatus === 'ready').length)

  const query = () => (productionId.value ? { productionId: productionId.value } : {})

  /** Reads the whole board (at first, after a filter change, and when the stream says to resync). */
  async function load() {
    const board = await boardApi.read(query())
    linesets.value = board.linesets
    unitSystem.value = board.unitSystem
    lastCheck.value = board.lastCheck
    loaded.value = true
  }

  /** Reads one lineset again after a change to it: replaced, added in number order, or gone from the board. */
  async function refreshLineset(id: string) {
    const [fresh] = (await boardApi.read({ ...query(), linesetId: id })).linesets
    const rest = linesets.value.filter((lineset) => lineset.id !== id)
    linesets.value = fresh ? [...rest, fresh].sort((a, b) => a.number - b.number) : rest
  }

  async function loadLatestCheck() {
    latest.value = await preRunChecksApi.latest()
    lastCheck.value = latest.value.check
  }

  async function recordCheck(body: PreRunCheckInput) {
    lastCheck.value = await preRunChecksApi.record(body)
    return lastCheck.value
  }

  return {
    linesets,
    unitSystem,
    lastCheck,
    latest,
    productionId,
    statusFilter,
    loaded,
    shown,
    readyCount,
    load,
    refreshLineset,
    loadLatestCheck,
    recordCheck,
  }
})
