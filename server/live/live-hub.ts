import type { LiveEvent } from './live-publisher.js'
import { listenLive, type LiveListener } from './postgres-live.js'

/** One open screen's interest in a venue's live events. */
export interface LiveSubscriber {
  venueId: string
  onEvent(event: LiveEvent): void
  /** Listening was lost and is back: events may have been missed meanwhile. */
  onGap(): void
  /** The app is stopping. */
  onClose(): void
}

/** Fans the live events of one LISTEN connection out to this process's subscribers, each of its own venue only. */
export interface LiveHub {
  /** Starts listening on the first subscriber; answers the unsubscribe. */
  subscribe(subscriber: LiveSubscriber): Promise<() => void>
  /** How many subscribers this process holds (tests prove none is left behind). */
  size(): number
  close(): Promise<void>
}

const log = (error: unknown) =>
  console.error('loftledger: live events:', error instanceof Error ? error.message : error)

/**
 * One dedicated connection per app process, opened when the first screen subscribes and opened again after
 * a failure (every `retryMs`); after such a gap every subscriber hears `onGap` so it can catch up from the
 * database, since PostgreSQL keeps no notification for a listener that was away.
 */
export function createLiveHub(databaseUrl: string, retryMs = 1000): LiveHub {
  const subscribers = new Set<LiveSubscriber>()
  let listener: LiveListener | null = null
  let starting: Promise<void> | null = null
  let retry: NodeJS.Timeout | null = null
  let closed = false
  let hadGap = false

  const deliver = (event: LiveEvent) => {
    for (const subscriber of subscribers) if (subscriber.venueId === event.venueId) subscriber.onEvent(event)
  }
  const lost = () => {
    listener = null
    hadGap = true
    scheduleRetry()
  }
  function scheduleRetry() {
    if (closed || retry) return
    retry = setTimeout(() => {
      retry = null
      void ensureListening()
    }, retryMs)
  }
  function ensureListening(): Promise<void> {
    if (closed || listener) return Promise.resolve()
    starting ??= listenLive(databaseUrl, deliver, lost)
      .then((opened) => {
        if (closed) return void opened.close().catch(() => {})
        listener = opened
        if (hadGap) for (const subscriber of subscribers) subscriber.onGap()
        hadGap = false
      })
      .catch((error) => {
        log(error)
        hadGap = true
        scheduleRetry()
      })
      .finally(() => {
        starting = null
      })
    return starting
  }

  return {
    async subscribe(subscriber) {
      subscribers.add(subscriber)
      await ensureListening()
      return () => void subscribers.delete(subscriber)
    },
    size: () => subscribers.size,
    async close() {
      closed = true
      if (retry) clearTimeout(retry)
      for (const subscriber of [...subscribers]) subscriber.onClose()
      subscribers.clear()
      await starting
      await listener?.close().catch(() => {})
      listener = null
    },
  }
}
