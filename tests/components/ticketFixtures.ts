import type { TicketView } from '../../shared/schemas/index.js'
import { personWith } from './fixtures'

/** Made-up tickets for the component tests (invented venue, people and figures). */
export const FULL = 'a0000000-0000-4000-8000-0000000000f1'
export const HALF = 'a0000000-0000-4000-8000-0000000000f2'
export const OPERATOR = { id: 'c0000000-0000-4000-8000-000000000003', name: 'Sam Rail' }

export const ticket = (overrides: Partial<TicketView> = {}): TicketView => ({
  id: 'e0000000-0000-4000-8000-000000000001',
  state: 'requested',
  version: 0,
  linesetId: '2c6a8d10-0000-4000-8000-000000000012',
  lineset: { number: 12, name: 'Main drape' },
  hangId: 'd0000000-0000-4000-8000-000000000001',
  hang: { revision: 3, title: 'Act two' },
  changes: [
    { brickTypeId: FULL, name: 'Full steel', count: 4 },
    { brickTypeId: HALF, name: 'Half steel', count: -2 },
  ],
  arborAfter: [
    { brickTypeId: FULL, count: 14 },
    { brickTypeId: HALF, count: 1 },
  ],
  bricks: [
    {
      brickTypeId: FULL,
      name: 'Full steel',
      count: 4,
      before: 10,
      after: 14,
      reserved: 0,
      loaded: null,
      unitWeight: 20,
    },
    {
      brickTypeId: HALF,
      name: 'Half steel',
      count: -2,
      before: 3,
      after: 1,
      reserved: 0,
      loaded: null,
      unitWeight: 10,
    },
  ],
  expectedOutOfBalance: 3.5,
  loadedOutOfBalance: null,
  purchaseRatio: 1,
  balanceTolerance: 10,
  unitSystem: 'imperial',
  openedBy: OPERATOR,
  openedAt: '2031-03-14T12:00:00.000Z',
  decidedBy: null,
  decidedAt: null,
  comments: [],
  feltBalance: null,
  shortfall: [],
  ...overrides,
})

/** The signed-in person of the component fixtures, as a ticket names people. */
export const signedInAs = (role: Parameters<typeof personWith>[0]) => {
  const person = personWith(role)
  return { person, asName: { id: person.id, name: person.name } }
}
