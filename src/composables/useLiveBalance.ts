import { computed, inject, provide, ref, toValue, type InjectionKey, type MaybeRefOrGetter } from 'vue'
import type { BrickType, Lineset, Venue } from '../../shared/schemas/index.js'
import {
  calculationInputSchema,
  type CalculationInput,
  type CalculationResult,
} from '../../shared/schemas/calculation.js'
import { fieldsFromIssues } from '../../shared/errors/fields.js'
import { runCalculation } from '../../shared/engine/calculate.js'
import { linesetCalculationInput } from '../../shared/hang/lineset-calculation.js'
import { emptyRow, isBlankRow, itemFrom, type BalanceRow } from './balanceRows'

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
}

/** Messages for one row: per figure (`at`, `weight`, ...) and for the row as a whole (`row`). */
export type RowMessages = Partial<Record<string, string>>

/**
 * A hang tried in the browser: the rows someone types, the engine input built from them and the lineset as
 * saved, and the engine's answer, recomputed on every keystroke (a normal hang takes a few milliseconds).
 * Nothing is saved. On refusal the result is null, so no figure from an earlier keystroke stays on screen.
 */
export function useLiveBalance(sources: Sources) {
  const rows = ref<BalanceRow[]>([emptyRow()])
  // Which row each engine item came from: blank rows are left out, so the indexes differ.
  const counted = computed(() => rows.value.filter((row) => !isBlankRow(row)))

  const input = computed<CalculationInput | null>(() => {
    const venue = toValue(sources.venue)
    if (!venue) return null
    const base = linesetCalculationInput({
      lineset: toValue(sources.lineset),
      venue,
      brickTypes: toValue(sources.brickTypes),
      items: [],
    })
    // Rows go in as typed (figures may be missing) so the engine's messages name what each one lacks.
    return { ...base, items: counted.value.map(itemFrom) }
  })

  const outcome = computed(() => (input.value ? calculateSafely(input.value) : null))
  const result = computed<CalculationResult | null>(() => (outcome.value?.ok ? outcome.value.result : null))
  const fields = computed(() => (outcome.value && !outcome.value.ok ? (outcome.value.error.error.fields ?? {}) : {}))

  /** Engine messages keyed by row id; `items.2.at` lands on the third counted row's position. */
  const rowMessages = computed(() => {
    const byRow: Record<number, RowMessages> = {}
    const place = (path: string, message: string, rows: readonly BalanceRow[]) => {
      const [head, index, key] = path.split('.')
      const row = head === 'items' && index !== undefined ? rows[Number(index)] : undefined
      if (row) (byRow[row.id] ??= {})[key ?? 'row'] = message
    }
    for (const [path, message] of Object.entries(fields.value)) place(path, message, counted.value)
    // The schema leaves its cross-field rules (beyond the batten end) until every figure reads as a number, so
    // each row is also checked alone: a stretch past the end shows while another row still holds a typo.
    if (input.value && Object.keys(fields.value).length) {
      // Only the batten bears on an item's own rules: a set needing nothing else keeps each check small.
      const { units, batten } = input.value
      for (const row of counted.value) {
        if (byRow[row.id]) continue
        const alone = calculationInputSchema.safeParse({ units, kind: 'hemp-multi', batten, items: [itemFrom(row)] })
        if (!alone.success)
          for (const [path, message] of Object.entries(fieldsFromIssues(alone.error.issues)))
            place(path, message, [row])
      }
    }
    return byRow
  })

  /** What stops the sum that no row can fix: the lineset's own figures, or the list as a whole. */
  const otherProblems = computed(() => {
    if (!outcome.value || outcome.value.ok) return []
    const { message, fields: named } = outcome.value.error.error
    if (!named) return [{ path: '(root)', message }]
    return Object.entries(named)
      .filter(([path]) => !/^items\.\d+/.test(path))
      .map(([path, text]) => ({ path, message: text }))
  })

  const add = (kind: BalanceRow['kind'] = 'point') => rows.value.push(emptyRow(kind))
  const remove = (id: number) => (rows.value = rows.value.filter((row) => row.id !== id))
  /** Rows change only here, so the list that owns them is the one place they are written. */
  const update = (id: number, patch: Partial<Omit<BalanceRow, 'id'>>) => {
    const row = rows.value.find((candidate) => candidate.id === id)
    if (row) Object.assign(row, patch)
  }

  return { rows, input, outcome, result, rowMessages, otherProblems, add, remove, update }
}

export type LiveBalance = ReturnType<typeof useLiveBalance>

const balanceKey: InjectionKey<LiveBalance> = Symbol('live-balance')

export const provideLiveBalance = (balance: LiveBalance) => provide(balanceKey, balance)

/** The hang being tried in the enclosing LinesetBalancePanel; its item rows read and write through it. */
export function useLiveBalanceContext(): LiveBalance {
  const balance = inject(balanceKey)
  if (!balance) throw new Error('A balance item row must sit inside LinesetBalancePanel')
  return balance
}
