import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import type { Lineset } from '../../shared/schemas/index.js'
import { runCalculation } from '../../shared/engine/calculate.js'
import { BALANCE_CAUTIONS, FIGURES_DISCLAIMER } from '../../shared/engine/cautions.js'
import { expandHangEntries, type HangEntry } from '../../shared/hang/hang-items.js'
import { linesetCalculationInput } from '../../shared/hang/lineset-calculation.js'
import { brickTypesApi } from '../../src/api/brick-types'
import { ApiError } from '../../src/api/errors'
import { hangsApi } from '../../src/api/hangs'
import { itemTypesApi } from '../../src/api/item-types'
import { productionsApi } from '../../src/api/productions'
import { showFigure } from '../../src/composables/balanceFigures'
import { lineset, venue } from './fixtures'
import {
  BRICKS,
  CLOSED,
  PLANNED,
  REVISION_3,
  RUNNING,
  SPOT,
  TWO_LINES,
  WASH,
  choose,
  field,
  lineLoads,
  openEditor,
  type,
} from './hangEditorSetup'

vi.mock('../../src/api/brick-types', () => ({
  brickTypesApi: { list: vi.fn(), create: vi.fn(), update: vi.fn(), remove: vi.fn() },
}))
vi.mock('../../src/api/hangs', () => ({ hangsApi: { list: vi.fn(), read: vi.fn(), save: vi.fn() } }))
vi.mock('../../src/api/item-types', () => ({ itemTypesApi: { list: vi.fn() } }))
vi.mock('../../src/api/productions', () => ({ productionsApi: { list: vi.fn() } }))

const HEMP = lineset({
  kind: 'hemp-multi',
  battenLength: 48,
  pickPoints: [4, 24, 44],
  sandbagWeight: 60,
  arborEmptyWeight: null,
  arborCapacity: null,
  pipeWeight: null,
  ratedLoad: 250,
})
const HOIST = lineset({
  kind: 'motorized',
  pickPoints: [2, 14, 26, 38],
  arborEmptyWeight: null,
  arborCapacity: null,
  pipeWeight: null,
  ratedLoad: null,
  hoistRatedCapacity: 2000,
})

let wrapper: VueWrapper | undefined
beforeEach(() => {
  // Cleared here as well: the counts of a module mock's functions outlive vi.clearAllMocks between tests.
  vi.mocked(brickTypesApi.list).mockClear().mockResolvedValue(BRICKS)
  vi.mocked(hangsApi.list).mockReset().mockResolvedValue([])
  vi.mocked(hangsApi.read).mockReset()
  vi.mocked(itemTypesApi.list).mockReset().mockResolvedValue([WASH, SPOT])
  vi.mocked(productionsApi.list).mockReset().mockResolvedValue([RUNNING, PLANNED, CLOSED])
})
afterEach(() => {
  wrapper?.unmount()
  vi.clearAllMocks()
})

const open = async (set: Lineset, role?: Parameters<typeof openEditor>[1]) => (wrapper = await openEditor(set, role))
/** What the shared code itself answers for the same lineset, venue, bricks and entries. */
function engine(set: Lineset, entries: HangEntry[]) {
  const library = new Map([WASH, SPOT].map((t) => [t.id, t]))
  const expanded = expandHangEntries(entries, library, 'imperial', 250)
  if (!expanded.ok) throw new Error(JSON.stringify(expanded.problems))
  const outcome = runCalculation(
    linesetCalculationInput({ lineset: set, venue, brickTypes: BRICKS, items: expanded.items }),
  )
  if (!outcome.ok) throw new Error(outcome.error.error.message)
  return outcome.result
}
const total = (w: VueWrapper) => w.get('[data-testid="balance-totals"]').text()

describe('HangEditor, opening and typing', () => {
  it('when the lineset has saved hangs, then the editor opens with the latest revision and its figures', async () => {
    vi.mocked(hangsApi.list).mockResolvedValue([{ ...REVISION_3 }])
    vi.mocked(hangsApi.read).mockResolvedValue(REVISION_3)
    const w = await open(TWO_LINES)
    expect(hangsApi.read).toHaveBeenCalledWith(TWO_LINES.id, REVISION_3.id)
    expect(w.get('[data-testid="hang-revision"]').text()).toBe('Revision 3, saved by Sam Rail on 4 Mar 2026')
    expect(w.get('[data-testid="hang-title"] input').element).toHaveProperty('value', 'First electric, after focus')
    expect(w.get('[data-testid="hang-production"]').text()).toContain('The Lighthouse Keeper')
    expect(w.get('[data-testid="hang-category-lighting"]').text()).toContain('Lighting (1)')
    expect(field(w, 0, 'label').get('input').element).toHaveProperty('value', 'Colour wash')
    expect(field(w, 1, 'weightPerLength').get('input').element).toHaveProperty('value', '0.04')
    // 3 washes of 12 + 2 lb at 10, 20, 30 and 0.04 lb/ft along 40 ft, symmetric on two lines.
    const expected = engine(TWO_LINES, REVISION_3.items)
    expect(total(w)).toContain(showFigure(expected.totalLoad, 'weight', 'imperial'))
    expect(lineLoads(w)).toEqual(['76.2 lb', '76.2 lb'])
    expect(w.find('[data-testid="hang-unsaved"]').exists()).toBe(false)
  })

  it('when the lineset has no hang yet, then the editor opens empty and says the first save makes revision 1', async () => {
    const w = await open(TWO_LINES)
    expect(hangsApi.read).not.toHaveBeenCalled()
    expect(w.get('[data-testid="hang-revision"]').text()).toContain('saving makes revision 1')
    expect(w.find('[data-testid="hang-items-empty"]').exists()).toBe(true)
    // Simple statics: the bare 108.8 lb batten split equally.
    expect(lineLoads(w)).toEqual(['54.4 lb', '54.4 lb'])
  })

  it('when the saved hang cannot be read, then the editor says so and the cautions still show', async () => {
    vi.mocked(hangsApi.list).mockRejectedValue(
      new ApiError(503, 'database_unavailable', 'The database is not answering'),
    )
    const w = await open(TWO_LINES)
    expect(w.get('[data-testid="hang-read-problem"]').text()).toContain('The database is not answering')
    expect(w.find('[data-testid="hang-save"]').exists()).toBe(false)
    expect(w.get('[data-testid="hang-cautions-waiting"]').text()).toContain(FIGURES_DISCLAIMER)
  })

  it('when library units are put at a point, then the line loads follow their weight with its allowance', async () => {
    const w = await open(TWO_LINES)
    await w.get('[data-testid="hang-add-lighting"]').trigger('click')
    await choose(w, 'hang-row-0-itemTypeId', WASH.id)
    expect(field(w, 0, 'label').get('input').element).toHaveProperty('value', 'LED wash')
    await type(w, 0, 'quantity', '4')
    await type(w, 0, 'at', '20')
    // 4 × (12 + 2) lb = 56 lb at the centre of two symmetric lines: (108.8 + 56) / 2 = 82.4 lb each.
    expect(lineLoads(w)).toEqual(['82.4 lb', '82.4 lb'])
    expect(field(w, 0, 'weight-in-all').text()).toBe('56 lb in all on the batten')
    expect(w.get('[data-testid="hang-unsaved"]').text()).toBe('Not saved')
  })

  it('when library units are spread along a stretch, then the first sits at its start and the last at its end', async () => {
    const w = await open(TWO_LINES)
    await w.get('[data-testid="hang-add-lighting"]').trigger('click')
    await choose(w, 'hang-row-0-itemTypeId', SPOT.id)
    await w.get('[data-testid="hang-row-0-placement-stretch"]').trigger('click')
    await type(w, 0, 'quantity', '2')
    await type(w, 0, 'from', '10')
    await type(w, 0, 'to', '20')
    // Two spots of 17 + 1.5 lb at 10 and 20 ft (simple statics): the one at 10 ft sits under the first line, the one
    // at 20 ft midway splits equally, so the first line takes 54.4 + 18.5 + 9.25 lb and the other 54.4 + 9.25 lb.
    expect(lineLoads(w)).toEqual(['82.15 lb', '63.65 lb'])
    const spread = engine(TWO_LINES, [
      { label: 'Ellipsoidal spotlight', category: 'lighting', itemTypeId: SPOT.id, quantity: 2, from: 10, to: 20 },
    ])
    expect(spread.lineLoads.map((line) => showFigure(line.load, 'weight', 'imperial'))).toEqual(lineLoads(w))
  })

  it('when soft goods are typed by fabric grade, then their weight is the worked check for 25 oz velour', async () => {
    const w = await open(TWO_LINES)
    await w.get('[data-testid="hang-add-soft-goods"]').trigger('click')
    await type(w, 0, 'label', 'Black velour border')
    await type(w, 0, 'grade', '25')
    await type(w, 0, 'height', '20')
    await type(w, 0, 'fullness', '100')
    await type(w, 0, 'from', '0')
    await type(w, 0, 'to', '40')
    // TRADE.md worked check: 40 ft × 20 ft of 25 oz velour at 100 % fullness weighs about 185.2 lb (fabric only).
    expect(total(w)).toContain('185.19 lb')
    expect(field(w, 0, 'weight-in-all').text()).toBe('185.19 lb in all on the batten')
    await w.get('[data-testid="hang-row-0-basis-area"]').trigger('click')
    await type(w, 0, 'weightPerArea', '0.1')
    // By area: 0.1 lb/ft² × 20 ft × 2 = 4 lb/ft over 40 ft = 160 lb.
    expect(total(w)).toContain('160 lb')
  })

  it('when scenery hangs from its own pick points, then its scale weight is shared between them', async () => {
    const w = await open(TWO_LINES)
    await w.get('[data-testid="hang-add-scenery"]').trigger('click')
    await choose(w, 'hang-row-0-kind', 'pickPoints')
    await type(w, 0, 'label', 'Lantern room')
    await type(w, 0, 'weight', '300')
    await type(w, 0, 'points', '10, 30')
    // 150 lb straight under each line: 54.4 + 150 = 204.4 lb each.
    expect(lineLoads(w)).toEqual(['204.4 lb', '204.4 lb'])
  })

  it('when an item sits beyond the batten end, then its row says so and no stale figures show', async () => {
    const w = await open(TWO_LINES)
    await w.get('[data-testid="hang-add-hardware"]').trigger('click')
    await type(w, 0, 'label', 'Counterweight pipe clamp')
    await type(w, 0, 'weight', '200')
    await type(w, 0, 'at', '20')
    expect(w.find('[data-testid="balance-line-loads"]').exists()).toBe(true)
    await type(w, 0, 'at', '45')
    expect(w.get('[data-testid="hang-row-0-messages"]').text()).toBe('At: Beyond the end of the batten (40 long)')
    for (const figures of ['balance-line-loads', 'balance-counterweight', 'balance-checks', 'balance-totals'])
      expect(w.find(`[data-testid="${figures}"]`).exists(), figures).toBe(false)
    expect(w.find('[data-testid="balance-row-problem"]').exists()).toBe(true)
  })

  it('when the set is hemp with a sandbag, then the haul force shows as the load less the sandbag', async () => {
    const w = await open(HEMP)
    expect(brickTypesApi.list).not.toHaveBeenCalled()
    await w.get('[data-testid="hang-add-other"]').trigger('click')
    await type(w, 0, 'label', 'Sign')
    await type(w, 0, 'weight', '100')
    await type(w, 0, 'at', '24')
    // Haul force = load − sandbag (TRADE.md): 48 ft × 2.72 lb/ft + 100 lb − 60 lb = 170.56 lb.
    expect(w.get('[data-testid="balance-haul-force"]').text()).toBe('170.56 lb')
  })

  it('when a motorized set is loaded past its hoist, then the danger comes first and the cautions stay beside it', async () => {
    const w = await open(HOIST)
    await w.get('[data-testid="hang-add-scenery"]').trigger('click')
    await type(w, 0, 'label', 'Truss section')
    await type(w, 0, 'weight', '2500')
    await type(w, 0, 'at', '20')
    // 40 ft × 2.72 lb/ft + 2,500 lb = 2,608.8 lb against a 2,000 lb hoist.
    expect(w.get('[data-testid="balance-hoist-load"]').text()).toContain('2,608.8 lb of its rated 2,000 lb (130%)')
    const levels = w.findAll('[data-testid^="balance-check-"]').map((item) => item.attributes('data-testid'))
    expect(levels[0]).toBe('balance-check-danger')
    const cautions = w.get('[data-testid="balance-results"]').get('[data-testid="balance-cautions"]').text()
    for (const caution of BALANCE_CAUTIONS) expect(cautions).toContain(caution)
    expect(cautions).toContain(FIGURES_DISCLAIMER)
    await type(w, 0, 'weight', 'heavy')
    expect(w.get('[data-testid="hang-row-0-messages"]').text()).toContain('must be a number')
    expect(w.get('[data-testid="balance-results"]').text()).toContain(FIGURES_DISCLAIMER)
    await flushPromises()
  })
})
