import type { Lineset, LinesetInput, LinesetUpdate } from '../../../shared/schemas/lineset.js'
import type { SessionUser } from '../../../shared/schemas/session.js'
import type { Database } from '../../db/models.js'
import { AppError, notFound, staleVersion } from '../../http/errors.js'
import { appendLinesetEvent } from '../ledger/ledger.service.js'
import { venueUnitSystem } from '../venues/venue.service.js'
import { linesetFromApi, linesetToApi } from './lineset.mapper.js'

const active = (venueId: string) => ({ venueId, retiredAt: null })

/** Every lineset in service or not, in number order; retired ones are history only. */
export async function listLinesets(db: Database, actor: SessionUser): Promise<Lineset[]> {
  const system = await venueUnitSystem(db, actor.venueId)
  const rows = await db.models.Lineset.findAll({ where: active(actor.venueId), order: [['number', 'ASC']] })
  return rows.map((row) => linesetToApi(row, system))
}

async function findOwn(db: Database, actor: SessionUser, id: string) {
  const row = await db.models.Lineset.findOne({ where: { id, ...active(actor.venueId) } })
  if (!row) throw notFound('That lineset')
  return row
}

export async function getLineset(db: Database, actor: SessionUser, id: string): Promise<Lineset> {
  const system = await venueUnitSystem(db, actor.venueId)
  return linesetToApi(await findOwn(db, actor, id), system)
}

async function refuseTakenNumber(db: Database, actor: SessionUser, number: number, exceptId?: string) {
  const clash = await db.models.Lineset.findOne({ where: { ...active(actor.venueId), number }, attributes: ['id'] })
  if (clash && clash.id !== exceptId)
    throw new AppError(409, 'duplicate', `Lineset number ${number} is already in use`, { number: 'Already in use' })
}

export async function createLineset(db: Database, actor: SessionUser, body: LinesetInput): Promise<Lineset> {
  const system = await venueUnitSystem(db, actor.venueId)
  await refuseTakenNumber(db, actor, body.number)
  const row = await db.sequelize.transaction(async (transaction) => {
    const created = await db.models.Lineset.create(
      { ...linesetFromApi(body, system), venueId: actor.venueId, retiredAt: null },
      { transaction },
    )
    await appendLinesetEvent(
      db,
      {
        venueId: actor.venueId,
        linesetId: created.id,
        actorId: actor.id,
        eventType: 'lineset-added',
        payload: { unitSystem: system, lineset: body },
      },
      transaction,
    )
    return created
  })
  return linesetToApi(row, system)
}

/** Saves a whole lineset if nobody changed it since `version` was read; a stale version is a 409, never an overwrite. */
export async function updateLineset(
  db: Database,
  actor: SessionUser,
  id: string,
  body: LinesetUpdate,
): Promise<Lineset> {
  const system = await venueUnitSystem(db, actor.venueId)
  await findOwn(db, actor, id)
  await refuseTakenNumber(db, actor, body.number, id)
  const { version, ...fields } = body
  await db.sequelize.transaction(async (transaction) => {
    const [count] = await db.models.Lineset.update(
      { ...linesetFromApi(fields, system), version: version + 1 },
      { where: { id, version, ...active(actor.venueId) }, transaction },
    )
    if (count === 0) throw staleVersion(`Lineset ${body.number}`)
    await appendLinesetEvent(
      db,
      {
        venueId: actor.venueId,
        linesetId: id,
        actorId: actor.id,
        eventType: 'lineset-changed',
        payload: { unitSystem: system, lineset: fields },
      },
      transaction,
    )
  })
  return linesetToApi(await findOwn(db, actor, id), system)
}

/** Takes a lineset out of the lists; its ledger stays. */
export async function retireLineset(db: Database, actor: SessionUser, id: string): Promise<void> {
  const row = await findOwn(db, actor, id)
  await db.sequelize.transaction(async (transaction) => {
    await row.update({ retiredAt: new Date(), version: row.version + 1 }, { transaction })
    await appendLinesetEvent(
      db,
      { venueId: actor.venueId, linesetId: id, actorId: actor.id, eventType: 'lineset-retired' },
      transaction,
    )
  })
}
