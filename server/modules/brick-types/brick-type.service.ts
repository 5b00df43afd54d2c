import type { BrickType, BrickTypeInput, BrickTypeUpdate } from '../../../shared/schemas/brick-type.js'
import type { SessionUser } from '../../../shared/schemas/session.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import type { Database } from '../../db/models.js'
import { apiFromStored, storedFromApi } from '../../db/quantities.js'
import { AppError, notFound, staleVersion } from '../../http/errors.js'
import { venueUnitSystem } from '../venues/venue.service.js'
import type { BrickTypeModel } from './brick-type.model.js'

function toApi(row: BrickTypeModel, system: UnitSystem): BrickType {
  return {
    id: row.id,
    version: row.version,
    name: row.name,
    material: row.material,
    unitWeight: apiFromStored(row.unitWeight, 'weight', system)!,
    thickness: apiFromStored(row.thickness, 'shortLength', system)!,
    quantityOwned: row.quantityOwned,
  }
}

function fromApi(body: BrickTypeInput, system: UnitSystem) {
  return {
    name: body.name,
    material: body.material,
    unitWeight: storedFromApi(body.unitWeight, 'weight', system)!,
    thickness: storedFromApi(body.thickness, 'shortLength', system)!,
    quantityOwned: body.quantityOwned,
  }
}

export async function listBrickTypes(db: Database, actor: SessionUser): Promise<BrickType[]> {
  const system = await venueUnitSystem(db, actor.venueId)
  const rows = await db.models.BrickType.findAll({ where: { venueId: actor.venueId }, order: [['name', 'ASC']] })
  return rows.map((row) => toApi(row, system))
}

async function refuseTakenName(db: Database, actor: SessionUser, name: string, exceptId?: string) {
  const clash = await db.models.BrickType.findOne({ where: { venueId: actor.venueId, name }, attributes: ['id'] })
  if (clash && clash.id !== exceptId)
    throw new AppError(409, 'duplicate', `A brick type named "${name}" already exists`, { name: 'Already in use' })
}

export async function createBrickType(db: Database, actor: SessionUser, body: BrickTypeInput): Promise<BrickType> {
  const system = await venueUnitSystem(db, actor.venueId)
  await refuseTakenName(db, actor, body.name)
  const row = await db.models.BrickType.create({ ...fromApi(body, system), venueId: actor.venueId })
  return toApi(row, system)
}

export async function updateBrickType(
  db: Database,
  actor: SessionUser,
  id: string,
  body: BrickTypeUpdate,
): Promise<BrickType> {
  const system = await venueUnitSystem(db, actor.venueId)
  const { version, ...fields } = body
  if (!(await db.models.BrickType.count({ where: { id, venueId: actor.venueId } }))) throw notFound('That brick type')
  await refuseTakenName(db, actor, body.name, id)
  const [count] = await db.models.BrickType.update(
    { ...fromApi(fields, system), version: version + 1 },
    { where: { id, venueId: actor.venueId, version } },
  )
  if (count === 0) throw staleVersion(`Brick type "${body.name}"`)
  return toApi((await db.models.BrickType.findByPk(id))!, system)
}

export async function deleteBrickType(db: Database, actor: SessionUser, id: string): Promise<void> {
  const count = await db.models.BrickType.destroy({ where: { id, venueId: actor.venueId } })
  if (count === 0) throw notFound('That brick type')
}
