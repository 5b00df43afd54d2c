import { Dec } from '../units/index.js'
import type { UnitSystem } from '../units/index.js'
import { fabricWeightPerLength, type FabricDescription } from './fabric.js'

/** What a hang item is, for sorting and for the venue's item library. Our own plain words. */
export const ITEM_CATEGORIES = ['lighting', 'audio-video', 'soft-goods', 'scenery', 'hardware', 'other'] as const
export type ItemCategory = (typeof ITEM_CATEGORIES)[number]

interface Labelled {
  label: string
  category: ItemCategory
}

/** One or more units of a known weight at one point (the weight is per unit). */
export interface PointEntry extends Labelled {
  weight: number
  at: number
  quantity?: number
}
/** A weight per length along a stretch of the batten (cable, a truss section, anything spread). */
export interface StretchEntry extends Labelled {
  weightPerLength: number
  from: number
  to: number
}
/** Soft goods worked out from their fabric, hung along a stretch. */
export interface FabricEntry extends Labelled {
  fabric: FabricDescription
  from: number
  to: number
}
/** Units of a library item type: all at one point, or spread evenly from `from` to `to`. */
export interface LibraryEntry extends Labelled {
  itemTypeId: string
  quantity: number
  at?: number
  from?: number
  to?: number
}
/** A piece weighed on a scale and hung from its own pick points on the batten, sharing its weight equally. */
export interface SharedEntry extends Labelled {
  weight: number
  points: number[]
}

export type HangEntry = PointEntry | StretchEntry | FabricEntry | LibraryEntry | SharedEntry

/** What the library says of one item type, in the venue's units: a unit's weight and what goes with each unit. */
export interface LibraryWeights {
  unitWeight: number
  allowancePerUnit: number
}

/** One load on the batten as the engine takes it. */
export type EngineItem =
  { label: string; weight: number; at: number } | { label: string; weightPerLength: number; from: number; to: number }

/** Why a list of entries cannot become loads (the caller names the field). */
export interface ExpansionProblem {
  index: number
  field: string
  message: string
}

const toNumber = (value: Dec) => value.toNumber()

/**
 * Where `count` units spread evenly from `from` to `to` sit: the first at `from`, the last at `to`; a single
 * unit sits midway.
 *
 * @example
 * spreadEvenly(3, 0, 10) // [0, 5, 10]
 */
export function spreadEvenly(count: number, from: number, to: number): number[] {
  if (count === 1) return [toNumber(Dec(from).plus(to).dividedBy(2))]
  const step = Dec(to)
    .minus(from)
    .dividedBy(count - 1)
  return Array.from({ length: count }, (_, index) =>
    index === count - 1 ? to : toNumber(step.times(index).plus(from)),
  )
}

/** How many engine loads an entry becomes, known before any is made, so a huge quantity is refused up front. */
export function loadCount(entry: HangEntry): number {
  if ('points' in entry) return entry.points.length
  if ('itemTypeId' in entry) return entry.at !== undefined ? 1 : entry.quantity
  return 1
}

/**
 * Turns what a fly operator typed into the loads the engine balances, with the library's weights. The same
 * code runs in the browser (live figures) and on the server (the saved revision), so both compute alike.
 *
 * @example
 * expandHangEntries([{ label: 'Wash', category: 'lighting', itemTypeId: 'w', quantity: 2, from: 2, to: 10 }],
 *   new Map([['w', { unitWeight: 12, allowancePerUnit: 2 }]]), 'imperial', 1000)
 * // { ok: true, items: [{ label: 'Wash', weight: 14, at: 2 }, { label: 'Wash', weight: 14, at: 10 }] }
 */
export function expandHangEntries(
  entries: readonly HangEntry[],
  library: ReadonlyMap<string, LibraryWeights>,
  units: UnitSystem,
  maxLoads: number,
): { ok: true; items: EngineItem[] } | { ok: false; problems: ExpansionProblem[] } {
  const total = entries.reduce((sum, entry) => sum + loadCount(entry), 0)
  if (total > maxLoads)
    return {
      ok: false,
      problems: [
        {
          index: -1,
          field: 'items',
          message: `These items make ${total} loads; at most ${maxLoads} can hang on one batten`,
        },
      ],
    }
  const problems: ExpansionProblem[] = []
  const items: EngineItem[] = []
  entries.forEach((entry, index) => {
    const { label } = entry
    if ('fabric' in entry) {
      items.push({
        label,
        weightPerLength: toNumber(fabricWeightPerLength(entry.fabric, units)),
        from: entry.from,
        to: entry.to,
      })
    } else if ('weightPerLength' in entry) {
      items.push({ label, weightPerLength: entry.weightPerLength, from: entry.from, to: entry.to })
    } else if ('points' in entry) {
      const share = toNumber(Dec(entry.weight).dividedBy(entry.points.length))
      for (const at of entry.points) items.push({ label, weight: share, at })
    } else if ('itemTypeId' in entry) {
      const known = library.get(entry.itemTypeId)
      if (!known)
        return problems.push({ index, field: 'itemTypeId', message: 'No such item type in this venue’s library' })
      const each = toNumber(Dec(known.unitWeight).plus(known.allowancePerUnit))
      if (entry.at !== undefined) items.push({ label, weight: toNumber(Dec(each).times(entry.quantity)), at: entry.at })
      else
        for (const at of spreadEvenly(entry.quantity, entry.from!, entry.to!)) items.push({ label, weight: each, at })
    } else {
      items.push({ label, weight: toNumber(Dec(entry.weight).times(entry.quantity ?? 1)), at: entry.at })
    }
  })
  return problems.length ? { ok: false, problems } : { ok: true, items }
}
