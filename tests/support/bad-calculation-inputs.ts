import { SAMPLE_INPUT } from '../unit/engine/lineset-input.js'

export const withBatten = (batten: Record<string, unknown>) => ({
  ...SAMPLE_INPUT,
  batten: { ...SAMPLE_INPUT.batten, ...batten },
})
export const withItems = (items: unknown[]) => ({ ...SAMPLE_INPUT, items })
const withBricks = (bricks: unknown[]) => ({ ...SAMPLE_INPUT, bricks })
const brick = (overrides: Record<string, unknown>) => ({
  name: 'full',
  weight: 20,
  thickness: 2,
  available: 80,
  ...overrides,
})

/** The hostile probe's request: one item of 1e11 lb on a plain counterweight set (it once held the server 108 s). */
export const PROBE_REQUEST = {
  units: 'imperial',
  kind: 'counterweight-single',
  batten: { length: 40, weightPerLength: 2.72, pickPoints: [0, 20, 40] },
  items: [{ weight: 100000000000, at: 20 }],
  arbor: { emptyWeight: 90, capacity: 1400, stackLength: 72 },
  bricks: [
    { name: 'full', weight: 19.5, thickness: 2, available: 100 },
    { name: 'half', weight: 9.75, thickness: 1, available: 100 },
  ],
}

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
  ['more than 250 items', withItems(Array.from({ length: 251 }, () => ({ weight: 1, at: 1 }))), 'items'],
  ['unknown units', { ...SAMPLE_INPUT, units: 'furlongs' }, 'units'],
  ['an unknown kind', { ...SAMPLE_INPUT, kind: 'trapeze' }, 'kind'],
  ['a counterweight set with no arbor', { ...SAMPLE_INPUT, arbor: undefined }, 'arbor'],
  ['an unknown pipe size', withBatten({ pipeSize: 'nps-9' }), 'batten.pipeSize'],
  [
    'a fractional brick count',
    { ...SAMPLE_INPUT, bricks: [{ name: 'full', weight: 20, thickness: 2, available: 1.5 }] },
    'bricks.0.available',
  ],
  // Figures outside their physical ranges (shared/schemas/ranges.ts).
  ["the probe's item of 1e11 lb", PROBE_REQUEST, 'items.0.weight'],
  ['an item of 1e21 lb', withItems([{ weight: 1e21, at: 5 }]), 'items.0.weight'],
  ['a weight too small to read back', withItems([{ weight: 1e-7, at: 5 }]), 'items.0.weight'],
  ['a batten of 1e-7 ft', withBatten({ length: 1e-7, pickPoints: [0] }), 'batten.length'],
  [
    'a 50 m batten',
    { ...SAMPLE_INPUT, units: 'metric', batten: { length: 50, weightPerLength: 4, pickPoints: [0] } },
    'batten.length',
  ],
  ['a spread of 1e9 lb/ft', withItems([{ weightPerLength: 1e9, from: 0, to: 40 }]), 'items.0.weightPerLength'],
  ['a brick weighing 1e-308 lb', withBricks([brick({ weight: 1e-308 })]), 'bricks.0.weight'],
  ['a brick weight of seven decimals', withBricks([brick({ weight: 19.1234567 })]), 'bricks.0.weight'],
  ['a million bricks of one type', withBricks([brick({ available: 1e6 })]), 'bricks.0.available'],
  ['more than 20 brick types', withBricks(Array.from({ length: 21 }, (_, k) => brick({ name: `b${k}` }))), 'bricks'],
  [
    'more than 24 pick points',
    withBatten({ pickPoints: Array.from({ length: 25 }, (_, k) => k) }),
    'batten.pickPoints',
  ],
  [
    'a stack of 1e6 in',
    { ...SAMPLE_INPUT, arbor: { emptyWeight: 90, capacity: 2000, stackLength: 1e6 } },
    'arbor.stackLength',
  ],
  ['a design factor below 1', { ...SAMPLE_INPUT, liftLine: { designFactor: 0.5 } }, 'liftLine.designFactor'],
  // Text: control characters and broken Unicode are refused, never stored or changed (shared/schemas/text.ts).
  ['a NUL in an item label', withItems([{ label: 'drape\u0000', weight: 10, at: 5 }]), 'items.0.label'],
  ['a lone surrogate in a brick name', withBricks([brick({ name: 'full \uD800' })]), 'bricks.0.name'],
  ['a line break in a brick name', withBricks([brick({ name: 'full\nsteel' })]), 'bricks.0.name'],
]
