import type { Lineset, LinesetInput } from '../../../shared/schemas/lineset.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import { apiFromStored, storedFromApi, toApiFields, toStoredFields, type QuantityMap } from '../../db/quantities.js'
import type { LinesetModel } from './lineset.model.js'

/** Which quantity each figure of a lineset is, for converting between the venue's units and SI. */
export const LINESET_QUANTITIES = {
  distanceFromPlasterLine: 'length',
  battenLength: 'length',
  pipeWeightPerLength: 'weightPerLength',
  pipeMomentOfInertia: 'momentOfInertia',
  pipeSectionModulus: 'sectionModulus',
  liftLineWeightPerLength: 'weightPerLength',
  liftLineBreakingStrength: 'weight',
  arborEmptyWeight: 'weight',
  arborCapacity: 'weight',
  arborStackLength: 'shortLength',
  ratedLoad: 'weight',
  pipeWeight: 'weight',
  travel: 'length',
  sandbagWeight: 'weight',
  hoistRatedCapacity: 'weight',
  hoistSpeed: 'speed',
} as const satisfies QuantityMap<string>

type QuantityField = keyof typeof LINESET_QUANTITIES

export function linesetToApi(row: LinesetModel, system: UnitSystem): Lineset {
  const figures = toApiFields(LINESET_QUANTITIES, row as unknown as Record<QuantityField, string | null>, system)
  return {
    id: row.id,
    version: row.version,
    updatedAt: row.updatedAt.toISOString(),
    number: row.number,
    name: row.name,
    kind: row.kind,
    status: row.status,
    pipeSize: row.pipeSize,
    notes: row.notes,
    ...figures,
    battenLength: figures.battenLength!,
    pipeWeightPerLength: figures.pipeWeightPerLength!,
    pickPoints: row.pickPoints.map((at) => apiFromStored(at, 'length', system)!),
  }
}

/** The stored attributes for a lineset body in the venue's units. */
export function linesetFromApi(body: LinesetInput, system: UnitSystem) {
  const figures = toStoredFields(LINESET_QUANTITIES, body, system)
  return {
    number: body.number,
    name: body.name,
    kind: body.kind,
    status: body.status,
    pipeSize: body.pipeSize,
    notes: body.notes ?? '',
    ...figures,
    battenLength: figures.battenLength!,
    pipeWeightPerLength: figures.pipeWeightPerLength!,
    pickPoints: body.pickPoints.map((at) => storedFromApi(at, 'length', system)!),
  }
}
