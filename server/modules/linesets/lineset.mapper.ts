import { LINESET_FIGURE_QUANTITIES, type Lineset, type LinesetInput } from '../../../shared/schemas/lineset.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import { apiFromStored, storedFromApi, toApiFields, toStoredFields } from '../../db/quantities.js'
import type { LinesetModel } from './lineset.model.js'

const LINESET_QUANTITIES = LINESET_FIGURE_QUANTITIES

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
