import { afterEach, describe, expect, it } from 'vitest'
import type { VueWrapper } from '@vue/test-utils'
import { runCalculation } from '../../shared/engine/calculate.js'
import LinesetBalanceResults from '../../src/components/LinesetBalanceResults.vue'
import type { ArborNowBrick } from '../../src/composables/arborHold'
import { mountWithApp } from './mount'

let wrapper: VueWrapper | undefined
afterEach(() => wrapper?.unmount())

// An invented electric: 108.8 lb of batten and 541.2 lb of lights on a single-purchase set with a 90 lb arbor,
// so the arbor needs exactly 560 lb of 20 lb "Full" bricks: 28 of them, in balance.
const outcome = runCalculation({
  units: 'imperial',
  kind: 'counterweight-single',
  arbor: { emptyWeight: 90, capacity: 2000, stackLength: 80 },
  bricks: [
    { name: 'Full', weight: 20, thickness: 2, available: 80 },
    { name: 'Half', weight: 10, thickness: 1, available: 40 },
  ],
  liftLine: { breakingStrength: 7000, designFactor: 8 },
  tolerance: 10,
  batten: { length: 40, weightPerLength: 2.72, pickPoints: [0, 10, 20, 30, 40] },
  items: [{ weightPerLength: 13.53, from: 0, to: 40 }],
})
if (!outcome.ok) throw new Error(JSON.stringify(outcome.error))
const result = outcome.result

const show = (arborNow?: ArborNowBrick[]) =>
  (wrapper = mountWithApp(LinesetBalanceResults, {
    props: { result, problems: [], rowProblems: false, tolerance: 10, arborNow },
  }))
const text = (w: VueWrapper, id: string) => w.get(`[data-testid="${id}"]`).text()
const held = (full: number, half: number): ArborNowBrick[] => [
  { name: 'Full', count: full, unitWeight: 20 },
  { name: 'Half', count: half, unitWeight: 10 },
]

describe('LinesetBalanceResults: what the arbor should hold, against what it holds', () => {
  it('the engine plans 28 Full in balance (the case the rest reads)', () => {
    expect(result.counterweight!.bricks.map((b) => [b.name, b.count])).toEqual([
      ['Full', 28],
      ['Half', 0],
    ])
    expect(result.counterweight!.outOfBalance).toBe(0)
  })

  it('when the arbor already holds the plan, then it reads as a total with nothing to move, never as bricks to load', () => {
    const w = show(held(28, 0))
    expect(w.text()).toContain('The arbor should hold')
    expect(w.text()).not.toContain('to load on the arbor')
    // The engine's own note says the same: a total, not an amount to load on top.
    expect(w.text()).toContain('In all, the arbor should hold 28 × Full (560 lb): a total, not bricks to add')
    expect(w.text()).not.toContain('Load 28')
    expect(text(w, 'balance-hold-explained')).toBe('In all, for this hang: a total, not bricks to add.')
    expect(text(w, 'balance-brick-Full')).toContain('28 × Full')
    expect(text(w, 'balance-hold-Full')).toBe('holds 28 now: nothing to move')
    expect(text(w, 'balance-arbor-moves')).toBe('Nothing to move: the arbor already holds this.')
    expect(w.find('[data-testid="balance-held-now"]').exists()).toBe(false)
    expect(w.find('[data-testid="balance-cautions"]').exists()).toBe(true)
  })

  it('when the arbor holds fewer of one type and some of another, then each difference is said and how the set stands now', () => {
    const w = show(held(26, 1))
    expect(text(w, 'balance-hold-Full')).toBe('holds 26 now: add 2')
    expect(text(w, 'balance-hold-Half')).toBe('holds 1 now: take off 1')
    expect(text(w, 'balance-brick-Half')).toContain('0 × Half')
    expect(text(w, 'balance-arbor-moves')).toBe('To match: add 2 × Full, take off 1 × Half.')
    // Now 30 lb lighter than planned on the arbor: 30 lb batten heavy, beyond the 10 lb tolerance.
    expect(text(w, 'balance-held-now')).toContain('As the arbor holds now: 30 lb batten heavy')
    expect(text(w, 'balance-held-now')).toContain("beyond the venue's tolerance of 10 lb")
    expect(w.find('[data-testid="balance-cautions"]').exists()).toBe(true)
    expect(w.html().indexOf('balance-arbor-moves')).toBeLessThan(w.html().indexOf('balance-cautions'))
  })

  it('when the page has not read the arbor, then the total shows with a word to compare before moving any', () => {
    const w = show()
    expect(text(w, 'balance-brick-plan')).toContain('28 × Full')
    expect(w.find('[data-testid="balance-hold-Full"]').exists()).toBe(false)
    expect(text(w, 'balance-arbor-moves')).toContain('move only the difference')
  })
})
