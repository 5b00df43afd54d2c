import { LINESET_FIGURE_QUANTITIES, type Lineset, type LinesetInput } from '../../../shared/schemas/lineset.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import { apiFromStored, storedFromApi, toApiFields, toStoredFields } from '../../db/quantities.js'
import type { InferAttributes } from 'sequelize'
import type { LinesetModel } from './lineset.model.js'

const LINESET_QUANTITIES = LINESET_FIGURE_QUANTITIES

type QuantityField = keyof typeof LINESET_QUANTITIES

/** A lineset's own fields as stored: text as typed, every figure an SI decimal string (pick points too). */
export type StoredLineset = ReturnType<typeof linesetFromApi>

/** The stored fields a ledger entry keeps, in the order the table has them. */
const STORED_FIELDS = [
  'number',
  'name',
  'kind',
  'status',
  ...Object.keys(LINESET_QUANTITIES),
  'pipeSize',
  'pickPoints',
  'liftLineLengths',
  'liftLineRope',
  'notes',
] as (keyof StoredLineset)[]

/** The API's figures (the venue's units) from stored SI ones. */
export function storedToApi(stored: StoredLineset, system: UnitSystem): Omit<Lineset, 'id' | 'version' | 'updatedAt'> {
  const figures = toApiFields(LINESET_QUANTITIES, stored as unknown as Record<QuantityField, string | null>, system)
  return {
    number: stored.number,
    name: stored.name,
    kind: stored.kind,
    status: stored.status,
    pipeSize: stored.pipeSize,
    notes: stored.notes,
    ...figures,
    battenLength: figures.battenLength!,
    pipeWeightPerLength: figures.pipeWeightPerLength!,
    pickPoints: stored.pickPoints.map((at) => apiFromStored(at, 'length', system)!),
    liftLineLengths: stored.liftLineLengths?.map((length) => apiFromStored(length, 'length', system)!) ?? null,
    liftLineRope: stored.liftLineRope ?? null,
    unitSystem: system,
  }
}

/** The stored fields of a row, as the ledger keeps them. */
export function storedFromRow(row: LinesetRow): StoredLineset {
  return Object.fromEntries(STORED_FIELDS.map((field) => [field, row[field as keyof LinesetRow]])) as StoredLineset
}

/** A lineset row: a model instance, or the plain attributes of a `raw` read (lists read thousands of figures). */
export type LinesetRow = InferAttributes<LinesetModel>

export function linesetToApi(row: LinesetRow, system: UnitSystem): Lineset {
  return {
    id: row.id,
    version: row.version,
    updatedAt: row.updatedAt.toISOString(),
    // A row holds every stored field under the same name: read in place, not copied first (lists map many).
    ...storedToApi(row as unknown as StoredLineset, system),
  }
}

/** The stored attributes for a lineset body typed in the venue's units. */
export function linesetFromApi(body: Omit<LinesetInput, 'unitSystem'>, system: UnitSystem) {
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
    liftLineLengths: body.liftLineLengths?.map((length) => storedFromApi(length, 'length', system)!) ?? null,
    liftLineRope: body.liftLineRope ?? null,
  }
}

/** The stored fields that differ between two versions of a row, in table order. */
export function changedFields(before: StoredLineset, after: StoredLineset): (keyof StoredLineset)[] {
  return STORED_FIELDS.filter((field) => JSON.stringify(before[field]) !== JSON.stringify(after[field]))
}
