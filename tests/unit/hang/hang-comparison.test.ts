import { describe, expect, it } from 'vitest'
import { compareRevisions, type RevisionToCompare } from '../../../shared/hang/hang-comparison.js'
import type { HangEntry } from '../../../shared/hang/hang-items.js'
import type { CalculationResult, CounterweightResult } from '../../../shared/schemas/calculation-result.js'

// Invented revisions of one invented lineset; the results are made up by hand, not computed by the engine.
const counterweight = (overrides: Partial<CounterweightResult> = {}): CounterweightResult => ({
  ratio: 1,
  battenSide: 500,
  required: 380,
  bricks: [{ name: 'Full brick', count: 19, weight: 380 }],
  loaded: 380,
  stackUsed: 38,
  arborSide: 500,
  outOfBalance: 0,
  ...overrides,
})

const result = (overrides: Partial<CalculationResult> = {}): CalculationResult => ({
  units: 'imperial',
  kind: 'counterweight-single',
  notice: 'The figures assist a qualified person.',
  unitLabels: { weight: 'lb', length: 'ft', shortLength: 'in', moment: 'lb·ft', stress: 'ksi' },
  battenWeight: 108.8,
  hardwareWeight: 0,
  itemsWeight: 280,
  totalLoad: 388.8,
  lineLoads: [
    { at: 4, load: 100 },
    { at: 24, load: 188.8 },
    { at: 44, load: 100 },
  ],
  moment: { max: -400, at: 24 },
  counterweight: counterweight(),
  checks: [],
  ...overrides,
})

const revision = (number: number, items: HangEntry[], res = result()): RevisionToCompare => ({
  revision: number,
  unitSystem: 'imperial',
  items,
  result: res,
})

const boom: HangEntry = { label: 'Boom arm', category: 'lighting', weight: 12, at: 1, quantity: 2 }
const drop: HangEntry = { label: 'Painted drop', category: 'soft-goods', weightPerLength: 1.1, from: 2, to: 46 }
const border: HangEntry = {
  label: 'Border',
  category: 'soft-goods',
  from: 0,
  to: 48,
  fabric: { gradeOzPerLinearYard: 25, height: 8, fullnessPercent: 50 },
}

describe('compareRevisions', () => {
  it('when an item is added, one removed and one changed, then each is listed and the alike ones are counted', () => {
    const older = revision(2, [boom, drop, border])
    const newer = revision(3, [
      { ...boom, weight: 14 },
      border,
      { label: 'Practical', category: 'lighting', weight: 6, at: 24 },
    ])
    const diff = compareRevisions(older, newer, 'imperial')
    expect(diff).toMatchObject({ from: 2, to: 3, unchanged: 1 })
    expect(diff.removed.map((item) => item.label)).toEqual(['Painted drop'])
    expect(diff.added.map((item) => item.label)).toEqual(['Practical'])
    expect(diff.changed).toEqual([
      {
        label: 'Boom arm',
        category: 'lighting',
        changes: [{ field: 'weight', words: 'weight', from: '12 lb', to: '14 lb' }],
      },
    ])
  })

  it('when quantity, position and fabric change, then each changed field is named with its before and after', () => {
    const moved = { ...boom, quantity: 3, at: 1.5 }
    const taller = { ...border, fabric: { ...border.fabric, height: 10, fullnessPercent: 100 } }
    const diff = compareRevisions(revision(1, [boom, border]), revision(2, [moved, taller]), 'imperial')
    const words = diff.changed.map((item) => item.changes.map((c) => `${c.words}: ${c.from} -> ${c.to}`))
    expect(words).toEqual([
      ['quantity: 2 -> 3', 'position: 1 ft -> 1.5 ft'],
      ['finished height: 8 ft -> 10 ft', 'fullness: 50 % -> 100 %'],
    ])
  })

  it('when the same label sits in two categories, or twice in one, then items are matched by label, category and order', () => {
    const legLeft: HangEntry = { label: 'Leg', category: 'soft-goods', weightPerLength: 3, from: 0, to: 9 }
    const legRight: HangEntry = { ...legLeft, from: 39, to: 48 }
    const scenicLeg: HangEntry = { label: 'Leg', category: 'scenery', weight: 80, at: 10 }
    const diff = compareRevisions(revision(1, [legLeft, legRight]), revision(2, [scenicLeg, legLeft]), 'imperial')
    expect(diff.unchanged).toBe(1)
    expect(diff.removed).toMatchObject([{ label: 'Leg', category: 'soft-goods' }])
    expect(diff.added).toMatchObject([{ label: 'Leg', category: 'scenery' }])
    expect(diff.changed).toEqual([])
  })

  it('when an item changes how it hangs, then the shape and the fields each side lacks are named', () => {
    const atPoint: HangEntry = { label: 'Truss', category: 'hardware', weight: 90, at: 24 }
    const alongStretch: HangEntry = { label: 'Truss', category: 'hardware', weightPerLength: 9, from: 19, to: 29 }
    const [truss] = compareRevisions(revision(1, [atPoint]), revision(2, [alongStretch]), 'imperial').changed
    expect(truss!.changes.map((c) => [c.field, c.from, c.to])).toEqual([
      ['shape', 'at a point', 'along a stretch'],
      ['weight', '90 lb', null],
      ['quantity', '1', null],
      ['at', '24 ft', null],
      ['weightPerLength', null, '9 lb/ft'],
      ['from', null, '19 ft'],
      ['to', null, '29 ft'],
    ])
  })

  it('when loads move, then total, each line and the counterweight differ by to minus from, with brick counts', () => {
    const heavier = result({
      totalLoad: 416.8,
      lineLoads: [
        { at: 4, load: 114 },
        { at: 24, load: 188.8 },
        { at: 44, load: 114 },
      ],
      counterweight: counterweight({
        required: 400,
        loaded: 400,
        arborSide: 520,
        outOfBalance: 8.8,
        bricks: [
          { name: 'Full brick', count: 18, weight: 360 },
          { name: 'Half brick', count: 4, weight: 40 },
        ],
      }),
    })
    const { loads } = compareRevisions(revision(1, [], result()), revision(2, [], heavier), 'imperial')
    expect(loads.totalLoad).toEqual({ from: 388.8, to: 416.8, change: 28 })
    expect(loads.lineLoads.map((line) => line.change)).toEqual([14, 0, 14])
    expect(loads.lineCountDiffers).toBe(false)
    expect(loads.counterweight).toMatchObject({
      required: { change: 20 },
      arborSide: { from: 500, to: 520, change: 20 },
      outOfBalance: { from: 0, to: 8.8, change: 8.8 },
      bricks: [
        { name: 'Full brick', from: 19, to: 18, change: -1 },
        { name: 'Half brick', from: 0, to: 4, change: 4 },
      ],
    })
    expect(loads.haulForce).toBeUndefined()
  })

  it('when the lines were changed between revisions, then the extra line shows on one side only and the mismatch is said', () => {
    const fourLines = result({
      lineLoads: [
        { at: 4, load: 90 },
        { at: 17, load: 110 },
        { at: 31, load: 110 },
        { at: 44, load: 90 },
      ],
    })
    const { loads } = compareRevisions(revision(1, [], result()), revision(2, [], fourLines), 'imperial')
    expect(loads.lineCountDiffers).toBe(true)
    expect(loads.lineLoads).toHaveLength(4)
    expect(loads.lineLoads[1]).toEqual({ line: 2, from: 188.8, to: 110, change: -78.8, fromAt: 24, toAt: 17 })
    expect(loads.lineLoads[3]).toEqual({ line: 4, from: null, to: 90, change: null, fromAt: null, toAt: 44 })
  })

  it('when the older revision was computed in metric and the venue now shows imperial, then its figures are converted', () => {
    // 100 kg = 220.462262 lb and 10 m = 32.808399 ft (NIST SP 811: 1 lb = 0.45359237 kg, 1 ft = 0.3048 m).
    const metric = result({
      units: 'metric',
      totalLoad: 100,
      lineLoads: [{ at: 10, load: 100 }],
      counterweight: undefined,
    })
    const imperial = result({
      totalLoad: 230.462262,
      lineLoads: [{ at: 32.808399, load: 230.462262 }],
      counterweight: undefined,
    })
    const diff = compareRevisions(revision(1, [], metric), revision(2, [], imperial), 'imperial')
    expect(diff.convertedFrom).toEqual({ from: 'metric', to: null })
    expect(diff.loads.totalLoad.from).toBeCloseTo(220.462262, 6)
    expect(diff.loads.totalLoad.change).toBeCloseTo(10, 6)
    expect(diff.loads.lineLoads[0]!.fromAt).toBeCloseTo(32.808399, 6)
    expect(diff.loads.counterweight).toBeUndefined()
  })

  it('when the items were kept in metric and the venue shows imperial, then they are converted before matching', () => {
    const metricBoom: RevisionToCompare = {
      revision: 1,
      unitSystem: 'metric',
      items: [{ ...boom, weight: 5, at: 0.3048 }],
      result: result({ units: 'metric' }),
    }
    const diff = compareRevisions(metricBoom, revision(2, [{ ...boom, weight: 11.023113, at: 1 }]), 'imperial')
    // 0.3048 m is exactly 1 ft (NIST SP 811), so the position is alike; 5 kg = 11.0231131 lb is not exactly
    // 11.023113 lb, so the weight reads as changed although both round to 11.02 lb.
    expect(diff.changed[0]!.changes).toEqual([{ field: 'weight', words: 'weight', from: '11.02 lb', to: '11.02 lb' }])
  })

  it('when the library item names are known, then a change of item type reads by name', () => {
    const spots: HangEntry = { label: 'Specials', category: 'lighting', itemTypeId: 'a', quantity: 8, from: 3, to: 46 }
    const names = new Map([
      ['a', 'Ellipsoidal spotlight'],
      ['b', 'LED wash'],
    ])
    const diff = compareRevisions(
      revision(1, [spots]),
      revision(2, [{ ...spots, itemTypeId: 'b', quantity: 10 }]),
      'imperial',
      names,
    )
    expect(diff.changed[0]!.changes).toEqual([
      { field: 'itemTypeId', words: 'library item', from: 'Ellipsoidal spotlight', to: 'LED wash' },
      { field: 'quantity', words: 'quantity', from: '8', to: '10' },
    ])
  })
})
