import { Op } from 'sequelize'
import type { OutboxMessage, OutboxMessageSummary, OutboxQuery } from '../../../shared/schemas/outbox.js'
import type { ServiceContext } from '../../context.js'
import { notFound } from '../../http/errors.js'
import { outboxMessageToApi, outboxSummaryToApi } from './outbox.mapper.js'

const SUMMARY = ['id', 'recipients', 'subject', 'createdAt', 'state', 'attempts', 'lastError', 'sentAt'] as const

/** The venue's outgoing mail, newest first; `before` (a message's id) continues after that message. */
export async function listOutbox(ctx: ServiceContext, query: OutboxQuery): Promise<OutboxMessageSummary[]> {
  const { db, transaction, actor } = ctx
  const where: Record<string | symbol, unknown> = { venueId: actor.venueId }
  if (query.before) {
    const after = await db.models.Outbox.findOne({
      where: { id: query.before, venueId: actor.venueId },
      attributes: ['id', 'createdAt'],
      transaction,
    })
    if (!after) throw notFound('That message')
    where[Op.or] = [
      { createdAt: { [Op.lt]: after.createdAt } },
      { createdAt: after.createdAt, id: { [Op.lt]: after.id } },
    ]
  }
  const rows = await db.models.Outbox.findAll({
    where,
    attributes: [...SUMMARY],
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: query.limit,
    transaction,
  })
  return rows.map(outboxSummaryToApi)
}

/** One message with its text; another venue's is a 404 like one that does not exist. */
export async function getOutboxMessage(ctx: ServiceContext, id: string): Promise<OutboxMessage> {
  const row = await ctx.db.models.Outbox.findOne({
    where: { id, venueId: ctx.actor.venueId },
    transaction: ctx.transaction,
  })
  if (!row) throw notFound('That message')
  return outboxMessageToApi(row)
}
