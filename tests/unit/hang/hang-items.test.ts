import { describe, expect, it } from 'vitest'
import { expandHangEntries, spreadEvenly, type HangEntry } from '../../../shared/hang/hang-items.js'

const library = new Map([['wash', { unitWeight: 12, allowancePerUnit: 2 }]])

describe('hang entries become the loads the engine balances', () => {
  it('when units are spread evenly along a stretch, then the first sits at from and the last at to', () => {
    expect(spreadEvenly(5, 4, 44)).toEqual([4, 14, 24, 34, 44])
    expect(spreadEvenly(1, 4, 44)).toEqual([24])
  })

  it('when library units are placed, then each weighs its unit weight plus its allowance', () => {
    const entries: HangEntry[] = [
      { label: 'Wash', category: 'lighting', itemTypeId: 'wash', quantity: 3, from: 10, to: 30 },
      { label: 'Wash pair', category: 'lighting', itemTypeId: 'wash', quantity: 2, at: 40 },
    ]
    expect(expandHangEntries(entries, library, 'imperial', 1000)).toEqual({
      ok: true,
      items: [
        { label: 'Wash', weight: 14, at: 10 },
        { label: 'Wash', weight: 14, at: 20 },
        { label: 'Wash', weight: 14, at: 30 },
        { label: 'Wash pair', weight: 28, at: 40 },
      ],
    })
  })

  it('when scenery hangs from its own pick points, then its scale weight is shared equally between them', () => {
    const outcome = expandHangEntries(
      [{ label: 'Flat', category: 'scenery', weight: 300, points: [10, 20, 30] }],
      library,
      'imperial',
      1000,
    )
    expect(outcome).toEqual({ ok: true, items: [10, 20, 30].map((at) => ({ label: 'Flat', weight: 100, at })) })
  })

  it('when a point entry has a quantity, then its weight is per unit', () => {
    const outcome = expandHangEntries(
      [{ label: 'Sandbag', category: 'hardware', weight: 25, at: 5, quantity: 4 }],
      library,
      'imperial',
      1000,
    )
    expect(outcome).toEqual({ ok: true, items: [{ label: 'Sandbag', weight: 100, at: 5 }] })
  })

  it('when soft goods are described by fabric, then they become a weight per length over their stretch', () => {
    const outcome = expandHangEntries(
      [
        {
          label: 'Border',
          category: 'soft-goods',
          from: 4,
          to: 44,
          fabric: { gradeOzPerLinearYard: 25, height: 20, fullnessPercent: 100 },
        },
      ],
      library,
      'imperial',
      1000,
    )
    if (!outcome.ok) throw new Error('expected loads')
    const border = outcome.items[0] as { weightPerLength: number }
    expect(border.weightPerLength * 40).toBeCloseTo(185.19, 2) // TRADE.md worked check: about 185.2 lb over 40 ft
  })

  it('when an item type is unknown or the entries make too many loads, then it says which, before making any', () => {
    expect(
      expandHangEntries(
        [{ label: 'X', category: 'lighting', itemTypeId: 'nope', quantity: 1, at: 1 }],
        library,
        'imperial',
        1000,
      ),
    ).toEqual({
      ok: false,
      problems: [{ index: 0, field: 'itemTypeId', message: 'No such item type in this venue’s library' }],
    })
    const huge = expandHangEntries(
      [{ label: 'W', category: 'lighting', itemTypeId: 'wash', quantity: 1e9, from: 0, to: 40 }],
      library,
      'imperial',
      1000,
    )
    expect(huge.ok).toBe(false)
  })
})
