import { QueryTypes } from 'sequelize'
import { ROLES } from '../../../shared/schemas/role.js'
import type { ServiceContext } from '../../context.js'

// The same test the session store makes on every request: the session is unexpired, its key names this member
// of this venue, and the membership still exists with a role that may follow the board.
const STILL_ALLOWED = `
  SELECT 1 AS allowed
    FROM sessions s
    JOIN memberships m
      ON m.user_id = (s.sess #>> '{passport,user,userId}')::uuid
     AND m.venue_id = (s.sess #>> '{passport,user,venueId}')::uuid
   WHERE s.sid = $1 AND s.expire >= to_timestamp($2)
     AND m.user_id = $3 AND m.venue_id = $4 AND m.role = ANY($5::text[])`

/**
 * Whether an open board stream may go on: a stream outlives the request that opened it, so signing out, the
 * session's expiry, a membership ended or a role no longer allowed must end it too (checked at each keep-alive).
 */
export async function streamStillAllowed(ctx: ServiceContext, sessionId: string): Promise<boolean> {
  const found = await ctx.db.sequelize.query<{ allowed: number }>(STILL_ALLOWED, {
    bind: [sessionId, Date.now() / 1000, ctx.actor.id, ctx.actor.venueId, [...ROLES]],
    type: QueryTypes.SELECT,
  })
  return found.length > 0
}
