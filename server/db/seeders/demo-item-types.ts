import type { ItemTypeInput } from '../../../shared/schemas/item-type.js'

// Demo data: typical weights from memory, in pounds. A venue weighs its own units or takes the maker's figure.
const DEMO_NOTE = 'Demo data: a typical weight from memory. Weigh your own unit before relying on it.'
// A C-clamp and safety cable go with every fixture (1-2 lb, from memory).
const CLAMP_AND_SAFETY = 1.5

const fixture = (name: string, unitWeight: number): ItemTypeInput => ({
  name,
  category: 'lighting',
  unitWeight,
  allowancePerUnit: CLAMP_AND_SAFETY,
  notes: DEMO_NOTE,
  unitSystem: 'imperial',
})

// Cable is hung by the run: a unit is one run of a stated length (12/3 about 0.16 lb/ft, 19-pin
// multicable about 0.5 lb/ft, data cable about 0.04 lb/ft, from memory).
const cableRun = (name: string, unitWeight: number): ItemTypeInput => ({
  name,
  category: 'hardware',
  unitWeight,
  allowancePerUnit: 0,
  notes: `${DEMO_NOTE} Tie-line and ties are not included.`,
  unitSystem: 'imperial',
})

/** The demo venue's item library. */
export const DEMO_ITEM_TYPES: ItemTypeInput[] = [
  fixture('Ellipsoidal spotlight', 17),
  fixture('Fresnel, 6 in', 10),
  fixture('PAR can', 6.5),
  fixture('LED wash', 11),
  fixture('Four-cell cyc light', 40),
  fixture('Moving light, spot', 55),
  fixture('Moving light, wash', 45),
  cableRun('Power cable run, 12/3, 25 ft', 4),
  cableRun('Multicable run, 19-pin, 50 ft', 25),
  cableRun('Data cable run, 50 ft', 2),
]
