import { afterEach, describe, expect, it, vi } from 'vitest'
import type { VueWrapper } from '@vue/test-utils'
import { calculate } from '../../shared/engine/calculate.js'
import { calculationInputSchema } from '../../shared/schemas/calculation.js'
import LinesetLineLoads from '../../src/components/LinesetLineLoads.vue'
import LinesetTravelBalance from '../../src/components/LinesetTravelBalance.vue'
import BrickStockPicture from '../../src/components/BrickStockPicture.vue'
import { mountWithApp } from './mount'

// The chart package's components are stood in for (tests/components/chartStandIn.ts): jsdom has no canvas.

let wrapper: VueWrapper | undefined
afterEach(() => wrapper?.unmount())

// A single-purchase set with 5 lines of 0.11 lb/ft over 48 ft of travel: a shift of 2·5·0.11·48 = 52.8 lb.
const input = calculationInputSchema.parse({
  units: 'imperial',
  kind: 'counterweight-single',
  batten: { length: 40, weightPerLength: 2.72, pickPoints: [0, 10, 20, 30, 40] },
  items: [{ label: 'Border', weightPerLength: 25, from: 0, to: 40 }],
  arbor: { emptyWeight: 90, capacity: 2000, stackLength: 60 },
  bricks: [{ name: 'full', weight: 20, thickness: 2, available: 80 }],
  liftLine: { weightPerLength: 0.11, breakingStrength: 2000, designFactor: 8 },
  tolerance: 10,
  travel: 48,
})
const result = calculate(input)
/** The chart itself loads lazily (its own chunk): wait until it is there. */
const chartLoaded = (w: VueWrapper) => vi.waitUntil(() => w.find('canvas[data-chart]').exists(), { timeout: 5000 })
const rowsOf = (w: VueWrapper, testid: string) =>
  w
    .get(`[data-testid="${testid}"]`)
    .findAll('tbody tr')
    .map((row) => row.text())

describe('the charts and their tables', () => {
  it('when a counterweight set travels 48 ft, then the travel table runs from in trim to out trim and says when it leaves the tolerance', async () => {
    wrapper = mountWithApp(LinesetTravelBalance, { props: { result, input, tolerance: 10 } })
    await chartLoaded(wrapper)
    const rows = rowsOf(wrapper, 'travel-balance-table')
    expect(rows).toHaveLength(5)
    expect(rows[0]).toMatch(/^In trim \(0 ft out\)/)
    expect(rows[4]).toMatch(/^Out trim \(48 ft out\)/)
    expect(rows[4]).toContain('outside tolerance')
    const { outOfBalance } = result.counterweight!
    expect(rows[0]).toContain(Math.abs(outOfBalance) <= 10 ? 'within tolerance' : 'outside tolerance')
    const chart = wrapper.get('canvas[data-chart="line"]')
    expect(chart.attributes('data-sets')).toBe('3')
    expect(chart.attributes('role')).toBe('img')
    expect(chart.attributes('aria-label')).toContain('at the out trim')
  })

  it('when a line carries more than its working load limit, then the bar table says so in words and the bars carry the limit', async () => {
    wrapper = mountWithApp(LinesetLineLoads, { props: { result } })
    await chartLoaded(wrapper)
    const rows = rowsOf(wrapper, 'line-loads-table')
    expect(rows).toHaveLength(5)
    // 2,000 lb breaking strength over a design factor of 8: a 250 lb limit; the inner lines carry more.
    expect(wrapper.get('[data-testid="line-loads-table"] caption').text()).toContain('250 lb')
    expect(rows.filter((row) => row.includes('Over its limit')).length).toBeGreaterThan(0)
    expect(rows.filter((row) => row.includes('Within its limit')).length).toBeGreaterThan(0)
    expect(wrapper.get('canvas[data-chart="bar"]').attributes('data-sets')).toBe('2')
  })

  it('when brick types are in three places, then the stock table lists each type by place with its weight in the venue units', async () => {
    const lines = [
      {
        brickTypeId: 'a',
        name: 'Full',
        owned: 100,
        onArbors: 60,
        reserved: 10,
        inStorage: 30,
        retired: false,
        byLineset: [],
      },
      {
        brickTypeId: 'b',
        name: 'Half',
        owned: 40,
        onArbors: 0,
        reserved: 0,
        inStorage: 40,
        retired: false,
        byLineset: [],
      },
    ]
    wrapper = mountWithApp(BrickStockPicture, {
      props: {
        lines,
        unitWeights: new Map([
          ['a', 9.5],
          ['b', 4.75],
        ]),
        units: 'metric',
      },
    })
    await chartLoaded(wrapper)
    const rows = rowsOf(wrapper, 'brick-stock-chart-table')
    expect(rows[0]).toBe('Full601030950 kg')
    expect(rows[1]).toBe('Half0040190 kg')
    const chart = wrapper.get('canvas[data-chart="bar"]')
    expect(chart.attributes('data-sets')).toBe('3')
    expect(chart.attributes('aria-label')).toContain('Full: 60 on arbors, 10 reserved, 30 in storage')
  })
})
