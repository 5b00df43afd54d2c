import bcrypt from 'bcryptjs'
import type { Transaction } from 'sequelize'
import type { Person, PersonInput, PersonUpdate } from '../../../shared/schemas/person.js'
import type { SessionUser } from '../../../shared/schemas/session.js'
import type { Database } from '../../db/models.js'
import { AppError, notFound, staleVersion } from '../../http/errors.js'
import type { MembershipModel } from './membership.model.js'

export const PASSWORD_HASH_ROUNDS = 12

function toApi(row: MembershipModel): Person {
  return {
    id: row.id,
    userId: row.userId,
    email: row.user!.email,
    name: row.user!.name,
    role: row.role,
    version: row.version,
  }
}

export async function listPeople(db: Database, actor: SessionUser): Promise<Person[]> {
  const rows = await db.models.Membership.findAll({
    where: { venueId: actor.venueId },
    include: [{ model: db.models.User, as: 'user' }],
    order: [[{ model: db.models.User, as: 'user' }, 'name', 'ASC']],
  })
  return rows.map(toApi)
}

async function findMember(db: Database, actor: SessionUser, id: string, transaction?: Transaction) {
  const row = await db.models.Membership.findOne({
    where: { id, venueId: actor.venueId },
    include: [{ model: db.models.User, as: 'user' }],
    transaction,
  })
  if (!row) throw notFound('That person')
  return row
}

/** Gives a person a role here: an existing account joins, a new one is created (its password is then required). */
export async function addPerson(db: Database, actor: SessionUser, body: PersonInput): Promise<Person> {
  const passwordHash = body.password ? await bcrypt.hash(body.password, PASSWORD_HASH_ROUNDS) : null
  const id = await db.sequelize.transaction(async (transaction) => {
    let user = await db.models.User.findOne({ where: { email: body.email }, transaction })
    if (!user) {
      if (!passwordHash)
        throw new AppError(400, 'validation_failed', 'A new account needs a password', {
          password: 'Enter a password for the new account',
        })
      user = await db.models.User.create({ email: body.email, name: body.name, passwordHash }, { transaction })
    }
    const existing = await db.models.Membership.findOne({
      where: { userId: user.id, venueId: actor.venueId },
      transaction,
    })
    if (existing)
      throw new AppError(409, 'duplicate', `${body.email} already has a role in this venue`, {
        email: 'Already a member',
      })
    const membership = await db.models.Membership.create(
      { userId: user.id, venueId: actor.venueId, role: body.role },
      { transaction },
    )
    return membership.id
  })
  return toApi(await findMember(db, actor, id))
}

/**
 * Runs a change to the venue's members with the venue row locked, so two administrators demoting or
 * removing each other at once are taken one after the other and the last administrator always stays.
 */
function withMembersLocked<T>(db: Database, actor: SessionUser, work: (transaction: Transaction) => Promise<T>) {
  return db.sequelize.transaction(async (transaction) => {
    await db.models.Venue.findByPk(actor.venueId, { transaction, lock: transaction.LOCK.UPDATE, attributes: ['id'] })
    return work(transaction)
  })
}

async function refuseLosingLastAdministrator(
  db: Database,
  actor: SessionUser,
  member: MembershipModel,
  transaction: Transaction,
) {
  if (member.role !== 'administrator') return
  const administrators = await db.models.Membership.count({
    where: { venueId: actor.venueId, role: 'administrator' },
    transaction,
  })
  if (administrators <= 1) throw new AppError(409, 'last_administrator', 'A venue must keep at least one administrator')
}

export async function changeRole(db: Database, actor: SessionUser, id: string, body: PersonUpdate): Promise<Person> {
  await withMembersLocked(db, actor, async (transaction) => {
    const member = await findMember(db, actor, id, transaction)
    if (member.version !== body.version) throw staleVersion(`${member.user!.name}'s role`)
    if (body.role !== 'administrator') await refuseLosingLastAdministrator(db, actor, member, transaction)
    await member.update({ role: body.role, version: body.version + 1 }, { transaction })
  })
  return toApi(await findMember(db, actor, id))
}

/** Removes a person's role here (their account stays, with any other venue's roles). */
export async function removePerson(db: Database, actor: SessionUser, id: string): Promise<void> {
  await withMembersLocked(db, actor, async (transaction) => {
    const member = await findMember(db, actor, id, transaction)
    if (member.userId === actor.id)
      throw new AppError(409, 'cannot_remove_self', 'You cannot remove yourself; ask another administrator')
    await refuseLosingLastAdministrator(db, actor, member, transaction)
    await member.destroy({ transaction })
  })
}
