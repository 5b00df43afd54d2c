import { expandHangEntries, type HangEntry } from '../../shared/hang/hang-items.js'
import { linesetCalculationInput } from '../../shared/hang/lineset-calculation.js'
import { MAX_ITEMS, type CalculationInput } from '../../shared/schemas/calculation.js'
import type { CalculationResult } from '../../shared/schemas/calculation-result.js'
import type { HangRevision, HangSummary, LinesetEventView } from '../../shared/schemas/index.js'
import { lineset, personWith, venue } from './fixtures'

// Invented revisions of the test lineset; the results are made up by hand, not computed by the engine. The inputs
// are built as the server builds the one it stores: the entries expanded, on the test lineset, in the venue's terms.
const operator = { id: personWith('fly-operator').id, name: 'Robin Crew' }

export const revisionResult = (totalLoad: number, lineLoads: number[], fullBricks: number): CalculationResult => ({
  units: 'imperial',
  kind: 'counterweight-single',
  notice: 'The figures assist a qualified person.',
  unitLabels: { weight: 'lb', length: 'ft', shortLength: 'in', moment: 'lb·ft', stress: 'ksi' },
  battenWeight: 108.8,
  hardwareWeight: 0,
  itemsWeight: totalLoad - 108.8,
  totalLoad,
  lineLoads: lineLoads.map((load, index) => ({ at: 5 + index * 10, load })),
  moment: { max: -300, at: 15 },
  counterweight: {
    ratio: 1,
    battenSide: totalLoad,
    required: fullBricks * 20,
    bricks: [{ name: 'Full brick', count: fullBricks, weight: fullBricks * 20 }],
    loaded: fullBricks * 20,
    stackUsed: fullBricks * 2,
    arborSide: 90 + 110 + fullBricks * 20,
    outOfBalance: 0,
  },
  checks: [],
})

const boom: HangEntry = { label: 'Boom arm', category: 'lighting', weight: 12, at: 1, quantity: 2 }
const drop: HangEntry = { label: 'Painted drop', category: 'soft-goods', weightPerLength: 1.1, from: 2, to: 38 }
const practical: HangEntry = { label: 'Practical lamp', category: 'lighting', weight: 6, at: 20 }

const revisions: Record<number, { title: string; items: HangEntry[]; result: CalculationResult }> = {
  1: { title: 'Rig', items: [drop], result: revisionResult(148.4, [30, 44, 44, 30.4], 2) },
  2: { title: 'After focus', items: [boom, drop], result: revisionResult(172.4, [50, 46, 46, 30.4], 3) },
  3: {
    title: 'With a practical',
    items: [{ ...boom, weight: 14 }, practical],
    result: revisionResult(200.4, [64, 46, 60, 30.4], 5),
  },
}

/** The engine input a revision of these entries stores (one load per point entry, one per stretch). */
export function revisionInput(items: HangEntry[]): CalculationInput {
  const expanded = expandHangEntries(items, new Map(), 'imperial', MAX_ITEMS)
  if (!expanded.ok) throw new Error('the fixture entries expand')
  return linesetCalculationInput({ lineset: lineset(), venue, brickTypes: [], items: expanded.items })
}

export const hangId = (revision: number) => `7a1e0000-0000-4000-8000-00000000000${revision}`

export const summary = (revision: number): HangSummary => ({
  id: hangId(revision),
  revision,
  title: revisions[revision]!.title,
  productionId: null,
  createdAt: `2025-03-0${revision}T18:00:00.000Z`,
  createdBy: operator,
  totalLoad: revisions[revision]!.result.totalLoad,
})

export const hangRevision = (revision: number, overrides: Partial<HangRevision> = {}): HangRevision => ({
  ...summary(revision),
  linesetId: lineset().id,
  unitSystem: 'imperial',
  items: revisions[revision]!.items,
  input: revisionInput(revisions[revision]!.items),
  result: revisions[revision]!.result,
  ...overrides,
})

export const savedEvent = (id: number, revision: number): LinesetEventView => ({
  id: String(id),
  type: 'hang-saved',
  occurredAt: summary(revision).createdAt,
  actor: operator,
  summary: `Saved hang revision ${revision}, “${summary(revision).title}”`,
  payload: { hang: { id: hangId(revision), revision, title: summary(revision).title } },
})

export const addedEvent: LinesetEventView = {
  id: '1',
  type: 'lineset-added',
  occurredAt: '2025-02-20T09:30:00.000Z',
  actor: null,
  summary: 'Added as lineset 12, Main drape',
  payload: {},
}
