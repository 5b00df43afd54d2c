import { Op } from 'sequelize'
import type { Invitation } from '../../../shared/schemas/invitation.js'
import type { PersonInput } from '../../../shared/schemas/person.js'
import { inTransaction, type ServiceContext } from '../../context.js'
import { AppError, notFound } from '../../http/errors.js'
import { queueMail, requireMailServer } from '../outbox/outbox.service.js'
import { invitationMail } from './invitation-mail.js'
import type { InvitationModel } from './invitation.model.js'
import { INVITATION_LIFETIME_DAYS, newInvitationToken } from './invitation-token.js'

const DAY_MS = 24 * 60 * 60 * 1000

export function invitationToApi(row: InvitationModel): Invitation {
  return {
    id: row.id,
    email: row.email,
    name: row.name,
    role: row.role,
    state: row.state,
    expiresAt: row.expiresAt.toISOString(),
    createdAt: row.createdAt.toISOString(),
  }
}

async function refuseMemberHere(ctx: ServiceContext, email: string) {
  // Only this venue's members are looked at: whether the address has an account elsewhere is never asked.
  const member = await ctx.db.models.Membership.count({
    where: { venueId: ctx.actor.venueId },
    include: [{ model: ctx.db.models.User, as: 'user', where: { email }, required: true }],
    transaction: ctx.transaction,
  })
  if (member)
    throw new AppError(409, 'duplicate', `${email} already has a role in this venue`, { email: 'Already a member' })
}

/**
 * Invites a person to a role here: a pending invitation (replacing any earlier one to the same address) and
 * an e-mail with a single-use link. The answer is the same whether or not the address has an account.
 * The e-mail is queued in the outbox in the same transaction, so the invitation and its message are kept
 * together or not at all, and it is delivered after commit (retried while the mail server is down).
 */
export function invite(ctx: ServiceContext, body: PersonInput): Promise<Invitation> {
  requireMailServer(ctx)
  return inTransaction(ctx, async (tx) => {
    const { db, actor, transaction } = tx
    await refuseMemberHere(tx, body.email)
    const now = tx.clock.now()
    await db.models.Invitation.update(
      { state: 'withdrawn', decidedAt: now, version: db.sequelize.literal('version + 1') },
      { where: { venueId: actor.venueId, email: body.email, state: 'pending' }, transaction },
    )
    const { token, tokenHash } = newInvitationToken()
    const row = await db.models.Invitation.create(
      {
        venueId: actor.venueId,
        email: body.email,
        name: body.name,
        role: body.role,
        tokenHash,
        invitedBy: actor.id,
        expiresAt: new Date(now.getTime() + INVITATION_LIFETIME_DAYS * DAY_MS),
      },
      { transaction },
    )
    const venue = await db.models.Venue.findByPk(actor.venueId, { attributes: ['name'], transaction })
    const mail = invitationMail({
      to: body.email,
      name: body.name,
      role: body.role,
      venueName: venue?.name ?? 'a venue',
      invitedBy: actor.name,
      link: `${tx.publicUrl}/invitation/${token}`,
    })
    await queueMail(tx, { ...mail, to: [body.email], cause: { kind: 'invitation', id: row.id } })
    return invitationToApi(row)
  })
}

/** The invitations still waiting for an answer, newest first (expired ones too, until withdrawn). */
export async function listInvitations(ctx: ServiceContext): Promise<Invitation[]> {
  const rows = await ctx.db.models.Invitation.findAll({
    where: { venueId: ctx.actor.venueId, state: 'pending' },
    order: [['createdAt', 'DESC']],
    transaction: ctx.transaction,
  })
  return rows.map(invitationToApi)
}

/** Withdraws a pending invitation; its link stops working. Conditional on it still being pending (else 404). */
export async function withdrawInvitation(ctx: ServiceContext, id: string): Promise<void> {
  const [count] = await ctx.db.models.Invitation.update(
    { state: 'withdrawn', decidedAt: ctx.clock.now(), version: ctx.db.sequelize.literal('version + 1') },
    { where: { id, venueId: ctx.actor.venueId, state: 'pending' }, transaction: ctx.transaction },
  )
  if (count === 0) throw notFound('That invitation')
}

export const pendingAndValid = (now: Date) => ({ state: 'pending', expiresAt: { [Op.gt]: now } })
