import { QueryTypes } from 'sequelize'
import type { LinesetListItem } from '../../../shared/schemas/lineset.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import type { ServiceContext } from '../../context.js'
import { listLinesets } from '../linesets/lineset.service.js'
import { getVenue } from '../venues/venue.service.js'

/** Bricks of one type on an arbor. */
export interface ArborBricks {
  name: string
  count: number
}

/** Everything the schedule prints, read for the acting member's venue. */
export interface ScheduleFacts {
  venueName: string
  unitSystem: UnitSystem
  linesets: Array<LinesetListItem & { arbor: ArborBricks[] }>
  /** Every brick type some arbor holds, by name (the CSV gives each its own column). */
  brickNames: string[]
}

/** What each arbor of the venue holds, by lineset id (types with none aboard left out), by brick name. */
export async function arborBricksByLineset(ctx: ServiceContext, linesetId?: string) {
  const found = await ctx.db.sequelize.query<{ linesetId: string; name: string; count: number }>(
    `SELECT a.lineset_id AS "linesetId", b.name, a.count
       FROM arbor_bricks a JOIN brick_types b ON b.id = a.brick_type_id
      WHERE a.venue_id = $1 AND a.count > 0 AND ($2::uuid IS NULL OR a.lineset_id = $2::uuid)
      ORDER BY b.name, b.id`,
    { bind: [ctx.actor.venueId, linesetId ?? null], type: QueryTypes.SELECT, transaction: ctx.transaction },
  )
  const arbors = new Map<string, ArborBricks[]>()
  for (const { linesetId: id, name, count } of found)
    arbors.set(id, [...(arbors.get(id) ?? []), { name, count: Number(count) }])
  return arbors
}

/** The venue's linesets in number order with their current hang, status and arbor contents. */
export async function scheduleFacts(ctx: ServiceContext): Promise<ScheduleFacts> {
  const venue = await getVenue(ctx)
  const linesets = await listLinesets(ctx)
  const arbors = await arborBricksByLineset(ctx)
  const withArbors = linesets.map((lineset) => ({ ...lineset, arbor: arbors.get(lineset.id) ?? [] }))
  const brickNames = [...new Set(withArbors.flatMap((lineset) => lineset.arbor.map((brick) => brick.name)))].sort()
  return { venueName: venue.name, unitSystem: venue.unitSystem, linesets: withArbors, brickNames }
}
