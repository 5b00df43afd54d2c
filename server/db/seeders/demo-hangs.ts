import type { HangEntry } from '../../../shared/hang/hang-items.js'

// The demo show's hangs, by lineset number (see demo-linesets.ts: single-purchase battens are 48 ft on lines
// at 4-44 ft, double-purchase ones 49 ft on lines at 2-47 ft). Every figure is demo data.

/** One saved revision: a title and its entries; `itemType` names a demo library type, resolved at seeding. */
export interface DemoRevision {
  title: string
  items: Array<HangEntry | DemoLibraryEntry>
}
export interface DemoLibraryEntry {
  label: string
  itemType: string
  quantity: number
  at?: number
  from?: number
  to?: number
}

// Velour sold at 25 oz per running yard of 54 in goods (a common weight for masking).
const velour = (label: string, from: number, to: number, height: number, fullnessPercent: number): HangEntry => ({
  label,
  category: 'soft-goods',
  from,
  to,
  fabric: { gradeOzPerLinearYard: 25, height, fullnessPercent },
})
const border = (height: number) => [velour('Black velour border', 0, 48, height, 50)]
const legs = (height: number) => [
  velour('Leg, stage left', 0, 9, height, 50),
  velour('Leg, stage right', 39, 48, height, 50),
]
const cable = (label: string, from: number, to: number, weightPerLength: number): HangEntry => ({
  label,
  category: 'hardware',
  from,
  to,
  weightPerLength,
})
const spread = (label: string, itemType: string, quantity: number, from: number, to: number): DemoLibraryEntry => ({
  label,
  itemType,
  quantity,
  from,
  to,
})

const electric = (spots: number, washes: number): DemoRevision['items'] => [
  spread('Front-of-stage specials', 'Ellipsoidal spotlight', spots, 3, 46),
  spread('Colour wash', 'LED wash', washes, 5, 44),
  spread('Power runs', 'Power cable run, 12/3, 25 ft', 4, 6, 42),
  spread('Multicable', 'Multicable run, 19-pin, 50 ft', 2, 12, 36),
  cable('Data line along the pipe', 2, 47, 0.04),
]

export const DEMO_HANGS: ReadonlyArray<{ number: number; revisions: DemoRevision[] }> = [
  { number: 1, revisions: [{ title: 'Main valance', items: [velour('Red velour valance', 0, 48, 6, 100)] }] },
  { number: 2, revisions: [{ title: 'House curtain', items: [velour('Red velour curtain', 0, 48, 26, 100)] }] },
  {
    number: 3,
    revisions: [
      { title: 'Border 1', items: border(8) },
      { title: 'Border 1, lowered trim', items: border(10) },
    ],
  },
  { number: 4, revisions: [{ title: 'Legs 1', items: legs(24) }] },
  {
    number: 5,
    revisions: [
      { title: 'First electric, rig', items: electric(8, 4) },
      { title: 'First electric, after focus', items: electric(10, 4) },
      {
        title: 'First electric, with side-light booms',
        items: [
          ...electric(10, 4),
          { label: 'Boom arm and fixture', category: 'lighting', weight: 40, at: 1, quantity: 2 },
        ],
      },
    ],
  },
  { number: 7, revisions: [{ title: 'Border 2', items: border(10) }] },
  { number: 8, revisions: [{ title: 'Legs 2', items: legs(24) }] },
  {
    number: 9,
    revisions: [
      {
        title: 'Show drop: the harbour',
        items: [
          { label: 'Painted muslin drop', category: 'soft-goods', weightPerLength: 1.1, from: 2, to: 46 },
          { label: 'Bottom pipe in pocket', category: 'hardware', weightPerLength: 1.7, from: 2, to: 46 },
        ],
      },
    ],
  },
  { number: 10, revisions: [{ title: 'Second electric', items: electric(12, 6) }] },
  { number: 12, revisions: [{ title: 'Border 3', items: border(10) }] },
  { number: 13, revisions: [{ title: 'Legs 3', items: legs(24) }] },
  {
    number: 15,
    revisions: [
      {
        title: 'Lighthouse lantern room',
        items: [{ label: 'Lantern room unit', category: 'scenery', weight: 380, points: [12, 24, 36] }],
      },
      {
        title: 'Lantern room with practical',
        items: [
          { label: 'Lantern room unit', category: 'scenery', weight: 380, points: [12, 24, 36] },
          { label: 'Practical lamp', itemType: 'PAR can', quantity: 1, at: 24 },
        ],
      },
    ],
  },
  { number: 17, revisions: [{ title: 'Third electric', items: electric(10, 8) }] },
  { number: 18, revisions: [{ title: 'Border 4', items: border(10) }] },
  { number: 19, revisions: [{ title: 'Legs 4', items: legs(24) }] },
  {
    number: 20,
    revisions: [
      {
        title: 'Sharkstooth scrim',
        items: [
          {
            label: 'Scrim',
            category: 'soft-goods',
            from: 0,
            to: 48,
            fabric: { weightPerArea: 0.02, height: 24, fullnessPercent: 0 },
          },
        ],
      },
    ],
  },
  {
    number: 29,
    revisions: [
      {
        title: 'Cyclorama electric',
        items: [
          spread('Cyc lights', 'Four-cell cyc light', 6, 4, 45),
          spread('Power runs', 'Power cable run, 12/3, 25 ft', 6, 4, 45),
        ],
      },
    ],
  },
]
