import { Op } from 'sequelize'
import type { LinesetEventsPage, LinesetEventsQuery } from '../../../shared/schemas/lineset-event.js'
import type { ServiceContext } from '../../context.js'
import { notFound } from '../../http/errors.js'
import { venueUnitSystem } from '../venues/venue.service.js'
import { payloadInUnits } from './lineset-event-payload.js'
import { summarizeLinesetEvent } from './lineset-event-summary.js'

/**
 * A page of a lineset's history, newest first, figures in the venue's units. Any member reads it; a
 * retired lineset's history stays readable, another venue's lineset is a 404.
 */
export async function listLinesetEvents(
  ctx: ServiceContext,
  linesetId: string,
  query: LinesetEventsQuery,
): Promise<LinesetEventsPage> {
  const { db, actor, transaction } = ctx
  const lineset = await db.models.Lineset.findOne({
    where: { id: linesetId, venueId: actor.venueId },
    attributes: ['id'],
    transaction,
  })
  if (!lineset) throw notFound('That lineset')
  const system = await venueUnitSystem(ctx)
  const rows = await db.models.LinesetEvent.findAll({
    where: {
      linesetId,
      venueId: actor.venueId,
      ...(query.before ? { id: { [Op.lt]: query.before } } : {}),
    },
    include: [{ model: db.models.User, as: 'actor', attributes: ['id', 'name'] }],
    order: [['id', 'DESC']],
    limit: query.limit + 1, // one more than asked tells whether another page follows
    transaction,
  })
  const page = rows.slice(0, query.limit)
  return {
    events: page.map((row) => {
      const payload = payloadInUnits(row.payload, system)
      return {
        id: String(row.id),
        type: row.eventType,
        occurredAt: row.occurredAt.toISOString(),
        actor: row.actor ? { id: row.actor.id, name: row.actor.name } : null,
        summary: summarizeLinesetEvent(row.eventType, payload, system),
        payload,
      }
    }),
    next: rows.length > query.limit ? String(page.at(-1)!.id) : null,
  }
}
