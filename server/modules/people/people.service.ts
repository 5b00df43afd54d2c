import type { Person, PersonUpdate } from '../../../shared/schemas/person.js'
import { inTransaction, type ServiceContext, type TransactionContext } from '../../context.js'
import { AppError, notFound, staleVersion } from '../../http/errors.js'
import type { MembershipModel } from './membership.model.js'

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

export async function listPeople(ctx: ServiceContext): Promise<Person[]> {
  const { db } = ctx
  const rows = await db.models.Membership.findAll({
    where: { venueId: ctx.actor.venueId },
    include: [{ model: db.models.User, as: 'user' }],
    order: [[{ model: db.models.User, as: 'user' }, 'name', 'ASC']],
    transaction: ctx.transaction,
  })
  return rows.map(toApi)
}

async function findMember(ctx: ServiceContext, id: string) {
  const row = await ctx.db.models.Membership.findOne({
    where: { id, venueId: ctx.actor.venueId },
    include: [{ model: ctx.db.models.User, as: 'user' }],
    transaction: ctx.transaction,
  })
  if (!row) throw notFound('That person')
  return row
}

/**
 * Runs a change to the venue's members with the venue row locked, so two administrators demoting or
 * removing each other at once are taken one after the other and the last administrator always stays.
 */
function withMembersLocked<T>(ctx: ServiceContext, work: (tx: TransactionContext) => Promise<T>) {
  return inTransaction(ctx, async (tx) => {
    await tx.db.models.Venue.findByPk(tx.actor.venueId, {
      transaction: tx.transaction,
      lock: tx.transaction.LOCK.UPDATE,
      attributes: ['id'],
    })
    return work(tx)
  })
}

async function refuseLosingLastAdministrator(tx: TransactionContext, member: MembershipModel) {
  if (member.role !== 'administrator') return
  const administrators = await tx.db.models.Membership.count({
    where: { venueId: tx.actor.venueId, role: 'administrator' },
    transaction: tx.transaction,
  })
  if (administrators <= 1) throw new AppError(409, 'last_administrator', 'A venue must keep at least one administrator')
}

/** Changes a member's role if nobody changed it since `version` was read (else 409). Answers from the row written. */
export function changeRole(ctx: ServiceContext, id: string, body: PersonUpdate): Promise<Person> {
  return withMembersLocked(ctx, async (tx) => {
    const member = await findMember(tx, id)
    if (member.version !== body.version) throw staleVersion(`${member.user!.name}'s role`)
    if (body.role !== 'administrator') await refuseLosingLastAdministrator(tx, member)
    const [count, rows] = await tx.db.models.Membership.update(
      { role: body.role, version: body.version + 1 },
      { where: { id, venueId: tx.actor.venueId, version: body.version }, transaction: tx.transaction, returning: true },
    )
    if (count === 0) throw staleVersion(`${member.user!.name}'s role`)
    const written = rows[0]!
    written.user = member.user
    return toApi(written)
  })
}

/** Removes a person's role here (their account stays, with any other venue's roles). */
export function removePerson(ctx: ServiceContext, id: string): Promise<void> {
  return withMembersLocked(ctx, async (tx) => {
    const member = await findMember(tx, id)
    if (member.userId === tx.actor.id)
      throw new AppError(409, 'cannot_remove_self', 'You cannot remove yourself; ask another administrator')
    await refuseLosingLastAdministrator(tx, member)
    const removed = await tx.db.models.Membership.destroy({
      where: { id, venueId: tx.actor.venueId },
      transaction: tx.transaction,
    })
    if (removed === 0) throw notFound('That person')
  })
}
