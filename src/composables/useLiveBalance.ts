import { computed, toValue, type MaybeRefOrGetter } from 'vue'
import type { BrickType, Lineset, Venue } from '../../shared/schemas/index.js'
import type { CalculationInput, CalculationResult } from '../../shared/schemas/calculation.js'
import { runCalculation } from '../../shared/engine/calculate.js'
import type { EngineItem } from '../../shared/hang/hang-items.js'
import { linesetCalculationInput } from '../../shared/hang/lineset-calculation.js'

type Outcome = ReturnType<typeof runCalculation>

/** An engine fault must not take the lineset page down with it; it reads as one more refusal. */
function calculateSafely(input: CalculationInput): Outcome {
  try {
    return runCalculation(input)
  } catch (thrown) {
    const message = thrown instanceof Error ? thrown.message : String(thrown)
    return {
      ok: false,
      error: { error: { code: 'internal_error', message: `The figures could not be worked out: ${message}` } },
    }
  }
}

interface Sources {
  lineset: MaybeRefOrGetter<Lineset>
  venue: MaybeRefOrGetter<Venue | null>
  brickTypes: MaybeRefOrGetter<readonly BrickType[]>
  /** The loads on the batten (expanded entries), or null while the typed items do not read. */
  items: MaybeRefOrGetter<readonly EngineItem[] | null>
}

/**
 * The engine's answer for a lineset as saved with the loads someone is typing, recomputed on every keystroke
 * (a normal hang takes a few milliseconds). The input is built by `linesetCalculationInput`, as on the server.
 * While the items do not read, or the engine refuses, the result is null, so no figure from an earlier
 * keystroke stays on screen.
 */
export function useLiveBalance(sources: Sources) {
  const input = computed<CalculationInput | null>(() => {
    const venue = toValue(sources.venue)
    const items = toValue(sources.items)
    if (!venue || !items) return null
    return linesetCalculationInput({
      lineset: toValue(sources.lineset),
      venue,
      brickTypes: toValue(sources.brickTypes),
      items,
    })
  })

  const outcome = computed(() => (input.value ? calculateSafely(input.value) : null))
  const result = computed<CalculationResult | null>(() => (outcome.value?.ok ? outcome.value.result : null))
  /** The engine's refusals by path (`items.3.at` names the fourth load, `batten.length` the lineset). */
  const fields = computed(() => (outcome.value && !outcome.value.ok ? (outcome.value.error.error.fields ?? {}) : {}))

  /** What stops the sum that no item row can fix: the lineset's own figures, or the list as a whole. */
  const otherProblems = computed(() => {
    if (!outcome.value || outcome.value.ok) return []
    const { message, fields: named } = outcome.value.error.error
    if (!named) return [{ path: '(root)', message }]
    return Object.entries(named)
      .filter(([path]) => !/^items\.\d+/.test(path))
      .map(([path, text]) => ({ path, message: text }))
  })

  return { input, outcome, result, fields, otherProblems }
}

export type LiveBalance = ReturnType<typeof useLiveBalance>
