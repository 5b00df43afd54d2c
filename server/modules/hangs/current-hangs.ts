import { QueryTypes } from 'sequelize'
import type { CurrentHang } from '../../../shared/schemas/hang.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import type { ServiceContext } from '../../context.js'
import { apiFromStored } from '../../db/quantities.js'

/** Each lineset's latest revision in the acting member's venue, by lineset id, total load in `system`. */
export async function currentHangs(ctx: ServiceContext, system: UnitSystem): Promise<Map<string, CurrentHang>> {
  const rows = await ctx.db.sequelize.query<{
    id: string
    lineset_id: string
    revision: number
    title: string
    total_load: string | null
  }>(
    `SELECT DISTINCT ON (lineset_id) id, lineset_id, revision, title, total_load
       FROM hangs WHERE venue_id = $1 ORDER BY lineset_id, revision DESC`,
    { bind: [ctx.actor.venueId], type: QueryTypes.SELECT, transaction: ctx.transaction },
  )
  return new Map(
    rows.map((row) => [
      row.lineset_id,
      {
        id: row.id,
        revision: row.revision,
        title: row.title,
        totalLoad: apiFromStored(row.total_load, 'weight', system) ?? 0,
      },
    ]),
  )
}
