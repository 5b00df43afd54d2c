import type { Lineset, LinesetDetail, SessionUser, Venue } from '../../shared/schemas/index.js'
import type { Role } from '../../shared/schemas/index.js'

/** Made-up records for the component tests; the figures are plausible, not from any real house. */
export const venue: Venue = {
  id: 'b0d7c6a2-4a4e-4c55-9a39-8f7d1b0e0001',
  name: 'Harbour Street Playhouse',
  unitSystem: 'imperial',
  balanceTolerance: 5,
  ropeLockHolding: 50,
  wireRopeDesignFactor: 8,
  version: 1,
}

export const personWith = (role: Role): SessionUser => ({
  id: '6f1c2a34-0000-4000-8000-000000000001',
  email: 'crew@example.test',
  name: 'Robin Crew',
  role,
  venueId: venue.id,
})

export const lineset = (overrides: Partial<Lineset> = {}): Lineset => ({
  id: '2c6a8d10-0000-4000-8000-000000000012',
  version: 3,
  updatedAt: '2025-01-01T00:00:00.000Z',
  number: 12,
  name: 'Main drape',
  kind: 'counterweight-single',
  status: 'in-service',
  distanceFromPlasterLine: 6.5,
  battenLength: 40,
  pipeSize: 'nps-1-1/2-sch40',
  pipeWeightPerLength: 2.72,
  pipeMomentOfInertia: 0.3099,
  pipeSectionModulus: 0.3262,
  pickPoints: [5, 15, 25, 35],
  liftLineWeightPerLength: null,
  liftLineBreakingStrength: null,
  liftLineLengths: null,
  liftLineRope: null,
  liftLineAxialStiffness: null,
  arborEmptyWeight: 90,
  arborCapacity: 1200,
  arborStackLength: null,
  ratedLoad: 1000,
  pipeWeight: 110,
  travel: null,
  sandbagWeight: null,
  hoistRatedCapacity: null,
  hoistSpeed: null,
  notes: '',
  unitSystem: 'imperial',
  ...overrides,
})

/** The sample lineset as `GET /linesets/:id` answers it: ready, not locked out. */
export const linesetDetail = (overrides: Partial<LinesetDetail> = {}): LinesetDetail => ({
  ...lineset(),
  operatingStatus: 'ready',
  lockout: null,
  ...overrides,
})
