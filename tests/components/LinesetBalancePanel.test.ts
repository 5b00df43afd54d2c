import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import type { BrickType, Lineset } from '../../shared/schemas/index.js'
import { runCalculation } from '../../shared/engine/calculate.js'
import { BALANCE_CAUTIONS, FIGURES_DISCLAIMER } from '../../shared/engine/cautions.js'
import { linesetCalculationInput, type HangItem } from '../../shared/hang/lineset-calculation.js'
import { brickTypesApi } from '../../src/api/brick-types'
import LinesetBalancePanel from '../../src/components/LinesetBalancePanel.vue'
import { balanceInWords } from '../../src/composables/balanceFigures'
import { useVenueStore } from '../../src/stores/venue'
import { mountWithApp } from './mount'
import { lineset, venue } from './fixtures'

vi.mock('../../src/api/brick-types', () => ({
  brickTypesApi: { list: vi.fn(), create: vi.fn(), update: vi.fn(), remove: vi.fn() },
}))

const BRICKS: BrickType[] = [
  {
    id: 'b1',
    name: 'Full steel',
    material: 'Steel',
    unitWeight: 19.5,
    thickness: 2,
    quantityOwned: 400,
    version: 1,
    unitSystem: 'imperial',
  },
  {
    id: 'b2',
    name: 'Lead trim',
    material: 'Lead',
    unitWeight: 5,
    thickness: 0.5,
    quantityOwned: 40,
    version: 1,
    unitSystem: 'imperial',
  },
]
// A 40 ft batten of 2.72 lb/ft pipe on two lines set symmetrically: the pipe alone weighs 108.8 lb.
const TWO_LINES = lineset({ pickPoints: [10, 30] })
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
})
afterEach(() => {
  wrapper?.unmount()
  vi.clearAllMocks()
})

async function openPanel(set: Lineset) {
  const pinia = createPinia()
  setActivePinia(pinia)
  useVenueStore().venue = venue
  wrapper = mountWithApp(LinesetBalancePanel, { props: { lineset: set }, global: { plugins: [pinia] } })
  await flushPromises()
  return wrapper
}

const type = async (w: VueWrapper, field: string, value: string) => {
  await w.get(`[data-testid="balance-row-0-${field}"] input`).setValue(value)
  await flushPromises()
}
const lineLoads = (w: VueWrapper) =>
  w.findAll('[data-testid$="-load"][data-testid^="balance-line-"]').map((cell) => cell.text())
/** What the engine itself answers for the same lineset, venue, bricks and items. */
const engine = (set: Lineset, items: HangItem[]) => {
  const outcome = runCalculation(linesetCalculationInput({ lineset: set, venue, brickTypes: BRICKS, items }))
  if (!outcome.ok) throw new Error(outcome.error.error.message)
  return outcome.result
}

describe('LinesetBalancePanel', () => {
  it('when an item is typed, then the line loads and the brick plan follow it', async () => {
    const w = await openPanel(TWO_LINES)
    // Bare batten, simple statics: 108.8 lb shared equally by two symmetric lines.
    expect(lineLoads(w)).toEqual(['54.4 lb', '54.4 lb'])
    // The 90 lb arbor and 110 lb of pipe weight aboard outweigh 108.8 lb of pipe by 91.2 lb: nothing to load.
    expect(w.get('[data-testid="balance-brick-plan"]').text()).toBe('No bricks beyond what is already aboard')
    expect(w.get('[data-testid="balance-out-of-balance"]').text()).toContain('91.2 lb arbor heavy')
    await type(w, 'label', 'Centre drop')
    await type(w, 'weight', '200')
    await type(w, 'at', '20')
    // Simple statics: a centred load on two symmetric lines splits equally, (108.8 + 200) / 2 = 154.4 lb each.
    expect(lineLoads(w)).toEqual(['154.4 lb', '154.4 lb'])
    const expected = engine(TWO_LINES, [{ label: 'Centre drop', weight: 200, at: 20 }]).counterweight!
    for (const brick of expected.bricks.filter((b) => b.count > 0))
      expect(w.get(`[data-testid="balance-brick-${brick.name}"]`).text()).toContain(`${brick.count} × ${brick.name}`)
    expect(expected.bricks.some((b) => b.count > 0)).toBe(true)
    const { words, signed } = balanceInWords(expected.outOfBalance, 'imperial')
    expect(w.get('[data-testid="balance-out-of-balance"]').text()).toContain(`${words} (${signed}`)
  })

  it('when an item is spread along the whole batten, then two symmetric lines share it equally', async () => {
    const w = await openPanel(TWO_LINES)
    await w.get('[data-testid="balance-row-0-kind-stretch"]').trigger('click')
    await type(w, 'weightPerLength', '10')
    // Simple statics: (2.72 + 10) lb/ft × 40 ft = 508.8 lb, half on each line.
    expect(lineLoads(w)).toEqual(['254.4 lb', '254.4 lb'])
  })

  it('when an item sits beyond the batten end, then its row shows the engine message and no stale figures show', async () => {
    const w = await openPanel(TWO_LINES)
    await type(w, 'weight', '200')
    await type(w, 'at', '20')
    expect(w.find('[data-testid="balance-line-loads"]').exists()).toBe(true)
    await type(w, 'at', '45')
    expect(w.get('[data-testid="balance-row-0-messages"]').text()).toBe(
      "At: Item at 45 is beyond the batten's length of 40",
    )
    expect(w.get('[data-testid="balance-row-0-at"]').classes()).toContain('v-input--error')
    for (const figures of ['balance-line-loads', 'balance-counterweight', 'balance-checks', 'balance-totals'])
      expect(w.find(`[data-testid="${figures}"]`).exists(), figures).toBe(false)
    expect(w.find('[data-testid="balance-row-problem"]').exists()).toBe(true)
  })

  it('when two rows are wrong in different ways, then each row shows its own message at once', async () => {
    const w = await openPanel(TWO_LINES)
    await type(w, 'weight', 'abc')
    await type(w, 'at', '12')
    await w.get('[data-testid="balance-add-item"]').trigger('click')
    await w.get('[data-testid="balance-row-1-kind-stretch"]').trigger('click')
    await w.get('[data-testid="balance-row-1-weightPerLength"] input').setValue('8')
    await w.get('[data-testid="balance-row-1-to"] input').setValue('60')
    await flushPromises()
    expect(w.get('[data-testid="balance-row-0-messages"]').text()).toBe('Weight: Item weight must be a number')
    expect(w.get('[data-testid="balance-row-1-messages"]').text()).toBe(
      "To: Span end at 60 is beyond the batten's length of 40",
    )
    expect(w.find('[data-testid="balance-line-loads"]').exists()).toBe(false)
  })

  it('when the set is hemp with a sandbag, then the haul force shows as the load less the sandbag', async () => {
    const w = await openPanel(HEMP)
    expect(brickTypesApi.list).not.toHaveBeenCalled()
    await type(w, 'weight', '100')
    await type(w, 'at', '24')
    // Haul force = load − sandbag (TRADE.md): 48 ft × 2.72 lb/ft + 100 lb − 60 lb = 170.56 lb.
    expect(engine(HEMP, [{ label: '', weight: 100, at: 24 }]).haul?.force).toBe(170.56)
    expect(w.get('[data-testid="balance-haul-force"]').text()).toBe('170.56 lb')
    expect(w.get('[data-testid="balance-haul"]').text()).toContain('less the sandbag of 60 lb')
  })

  it('when a motorized set is loaded past its hoist, then the load shows against the capacity and the danger comes first', async () => {
    const w = await openPanel(HOIST)
    await type(w, 'weight', '2500')
    await type(w, 'at', '20')
    // 40 ft × 2.72 lb/ft + 2,500 lb = 2,608.8 lb against a 2,000 lb hoist.
    expect(w.get('[data-testid="balance-hoist-load"]').text()).toContain('2,608.8 lb of its rated 2,000 lb (130%)')
    const levels = w.findAll('[data-testid^="balance-check-"]').map((item) => item.attributes('data-testid'))
    expect(levels[0]).toBe('balance-check-danger')
    expect(levels.indexOf('balance-check-info')).toBeGreaterThan(levels.lastIndexOf('balance-check-danger'))
    expect(w.get('[data-testid="balance-check-danger"]').text()).toContain('Stop.')
  })

  it('when figures show or are held back, then the cautions and the figures disclaimer render beside them', async () => {
    const w = await openPanel(TWO_LINES)
    const cautionsInResults = () => w.get('[data-testid="balance-results"]').find('[data-testid="balance-cautions"]')
    const expectCautions = () => {
      const text = cautionsInResults().text()
      for (const caution of BALANCE_CAUTIONS) expect(text).toContain(caution)
      expect(text).toContain(FIGURES_DISCLAIMER)
    }
    expect(w.find('[data-testid="balance-counterweight"]').exists()).toBe(true)
    expectCautions()
    await type(w, 'weight', 'heavy')
    expect(w.find('[data-testid="balance-counterweight"]').exists()).toBe(false)
    expectCautions()
  })
})
