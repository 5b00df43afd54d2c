import { SAMPLE_INPUT } from '../unit/engine/lineset-input.js'

export const withBatten = (batten: Record<string, unknown>) => ({
  ...SAMPLE_INPUT,
  batten: { ...SAMPLE_INPUT.batten, ...batten },
})
export const withItems = (items: unknown[]) => ({ ...SAMPLE_INPUT, items })

/** Bad calculation inputs and the field each must be refused on; shared by the engine's and the API's tests. */
export const BAD_CALCULATION_INPUTS: ReadonlyArray<[string, unknown, string]> = [
  ['pick points out of order', withBatten({ pickPoints: [0, 20, 10] }), 'batten.pickPoints.2'],
  ['a repeated pick point', withBatten({ pickPoints: [0, 10, 10] }), 'batten.pickPoints.2'],
  ['a pick point beyond the batten', withBatten({ pickPoints: [0, 41] }), 'batten.pickPoints.1'],
  ['a negative pick point', withBatten({ pickPoints: [-1, 10] }), 'batten.pickPoints.0'],
  ['no lift line', withBatten({ pickPoints: [] }), 'batten.pickPoints'],
  ['a zero-length batten', withBatten({ length: 0 }), 'batten.length'],
  ['a non-numeric length', withBatten({ length: '40' }), 'batten.length'],
  ['a negative item position', withItems([{ weight: 10, at: -1 }]), 'items.0.at'],
  ['an item beyond the batten', withItems([{ weight: 10, at: 41 }]), 'items.0.at'],
  ['a span that ends before it starts', withItems([{ weightPerLength: 1, from: 20, to: 10 }]), 'items.0.to'],
  ['a negative weight', withItems([{ weight: -5, at: 1 }]), 'items.0.weight'],
  ['an item with no weight', withItems([{ at: 3 }]), 'items.0.weight'],
  ['more than 1,000 items', withItems(Array.from({ length: 1001 }, () => ({ weight: 1, at: 1 }))), 'items'],
  ['unknown units', { ...SAMPLE_INPUT, units: 'furlongs' }, 'units'],
  ['an unknown kind', { ...SAMPLE_INPUT, kind: 'trapeze' }, 'kind'],
  ['a counterweight set with no arbor', { ...SAMPLE_INPUT, arbor: undefined }, 'arbor'],
  ['an unknown pipe size', withBatten({ pipeSize: 'nps-9' }), 'batten.pipeSize'],
  [
    'a fractional brick count',
    { ...SAMPLE_INPUT, bricks: [{ name: 'full', weight: 20, thickness: 2, available: 1.5 }] },
    'bricks.0.available',
  ],
]
