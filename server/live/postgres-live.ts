import pg from 'pg'
import type { Sequelize } from 'sequelize'
import type { LiveEvent, LivePublisher } from './live-publisher.js'

/** The one PostgreSQL channel live events travel on. */
export const LIVE_CHANNEL = 'loftledger_live'

// The horizon is read inside the change's own transaction, before it commits (see LiveEvent.horizon).
const NOTIFY_WITH_HORIZON = `SELECT pg_notify(:channel, (CAST(:payload AS jsonb)
  || jsonb_build_object('horizon', pg_snapshot_xmin(pg_current_snapshot())::text))::text)`

/**
 * Publishes with `pg_notify` inside the caller's transaction: PostgreSQL delivers it on commit and drops it
 * on rollback, so no screen hears of a change that did not happen, and every app process hears of it.
 */
export function postgresLivePublisher(sequelize: Sequelize): LivePublisher {
  return {
    async publish(event, transaction) {
      await sequelize.query(NOTIFY_WITH_HORIZON, {
        replacements: { channel: LIVE_CHANNEL, payload: JSON.stringify(event) },
        transaction,
      })
    },
  }
}

export interface LiveListener {
  close(): Promise<void>
}

/**
 * Hears every live event on a dedicated connection (LISTEN holds its connection, so never a pooled one).
 * `onLost` is called once when the connection fails or ends other than by `close()`.
 */
export async function listenLive(
  databaseUrl: string,
  onEvent: (event: LiveEvent) => void,
  onLost: () => void = () => {},
): Promise<LiveListener> {
  const client = new pg.Client({ connectionString: databaseUrl })
  let ended = false
  const lost = () => {
    if (ended) return
    ended = true
    onLost()
  }
  // A lost connection ends listening; the owner decides whether to listen again.
  client.on('error', lost)
  client.on('end', lost)
  await client.connect()
  client.on('notification', (message) => {
    if (message.channel !== LIVE_CHANNEL || !message.payload) return
    onEvent(JSON.parse(message.payload) as LiveEvent)
  })
  await client.query(`LISTEN ${LIVE_CHANNEL}`)
  return {
    close: () => {
      ended = true
      return client.end()
    },
  }
}
