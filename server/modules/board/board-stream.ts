import type { Request, RequestHandler, Response } from 'express'
import { memberContext, type AppContext } from '../../context.js'
import type { LiveHub } from '../../live/live-hub.js'
import type { LiveEvent } from '../../live/live-publisher.js'
import { streamStillAllowed } from './board-access.js'
import { resyncMessage, streamMessage, wireId } from './board-events.js'
import { currentHorizon, missedEvents, newestEventId, type StreamPosition } from './board-replay.js'

// `<id>` or `<id>.<horizon>` (see `wireId`); anything else starts afresh.
const LAST_EVENT_ID = /^([1-9]\d{0,17})(?:\.(\d{1,19}))?$/

const resumeFrom = (header: string | undefined): StreamPosition | null => {
  const match = header ? LAST_EVENT_ID.exec(header) : null
  return match ? { id: match[1]!, horizon: match[2] ?? null } : null
}

const log = (error: unknown) =>
  console.error('loftledger: board stream:', error instanceof Error ? error.message : error)

/**
 * `GET /board/stream`: the venue's changes as server-sent events. A fresh stream starts with `ready` (carrying
 * the newest id, so the browser's automatic reconnect sends it back as Last-Event-ID); a reconnect with
 * `Last-Event-ID` first hears what it missed from the database, or `resync` when that is too much. Writes go
 * one after another in order; an event replayed and then heard live is sent once. Each keep-alive first checks
 * that the session and membership still allow the stream, and ends it when they do not (or cannot be read).
 */
export function boardStream(app: AppContext, hub: LiveHub, keepAliveMs: number): RequestHandler {
  return async (req: Request, res: Response) => {
    const ctx = memberContext(app, req)
    res.writeHead(200, {
      'Content-Type': 'text/event-stream; charset=utf-8',
      'Cache-Control': 'no-store',
      Connection: 'keep-alive',
      'X-Accel-Buffering': 'no', // a buffering proxy would hold events back
    })
    res.write('retry: 2000\n\n')

    let open = true
    const from = resumeFrom(req.get('Last-Event-ID'))
    // The id and horizon the last message carried (at first, the ones asked with): where this stream resumes from.
    let position: StreamPosition | null = from
    let replayed = new Set<string>()
    let queue = Promise.resolve()
    const write = (text: string) => {
      if (open) res.write(text)
    }
    const later = (step: () => Promise<void> | void) => {
      queue = queue.then(step).catch((error) => {
        log(error)
        write(resyncMessage(null))
      })
    }
    const send = (event: Pick<LiveEvent, 'type' | 'linesetId' | 'eventId'>, horizon: string | null) => {
      write(streamMessage(event, horizon))
      if (event.eventId) position = { id: event.eventId, horizon }
    }
    const catchUp = async (from: StreamPosition) => {
      const missed = await missedEvents(ctx, from)
      if (missed.tooMany) {
        // The page reads the whole board after this: whatever committed before it is in that read.
        const newest = await newestEventId(ctx)
        replayed = new Set()
        if (newest.id) position = { id: newest.id, horizon: newest.horizon }
        return write(resyncMessage(newest.id, newest.horizon))
      }
      replayed = new Set(missed.events.map((event) => event.eventId))
      // Each keeps the horizon asked with: what this replay does not hold committed after it was read.
      for (const event of missed.events) send(event, from.horizon)
    }
    const live = (event: LiveEvent) =>
      later(() => {
        if (event.eventId && replayed.delete(event.eventId)) return
        // Notifications arrive in commit order, so whatever committed before this change was made has been
        // sent already; whatever commits later is at or after its horizon.
        send(event, event.horizon ?? position?.horizon ?? null)
      })

    let checking = false // one check at a time, however short the interval
    const keepAlive = setInterval(() => {
      if (checking) return
      checking = true
      later(async () => {
        const allowed = await streamStillAllowed(ctx, req.sessionID).catch(() => false)
        checking = false
        if (allowed) write(': keep-alive\n\n')
        else end()
      })
    }, keepAliveMs)
    let unsubscribe = () => {}
    const end = () => {
      if (!open) return
      open = false
      clearInterval(keepAlive)
      unsubscribe()
      res.end()
    }
    req.on('close', end)
    // Read before listening: whatever commits once this stream listens is at or after it.
    const startHorizon = from ? null : await currentHorizon(ctx).catch(() => null)
    unsubscribe = await hub.subscribe({
      venueId: ctx.actor.venueId,
      onEvent: live,
      // Listening was lost for a while: whatever happened meanwhile comes from the database.
      onGap: () => later(() => (position ? catchUp(position) : write(resyncMessage(null)))),
      onClose: end,
    })
    if (!open) return unsubscribe()

    if (from) later(() => catchUp(from))
    else
      later(async () => {
        const newest = await newestEventId(ctx)
        if (newest.id) position = { id: newest.id, horizon: startHorizon }
        const id = newest.id ? `id: ${wireId(newest.id, startHorizon)}\n` : ''
        write(`event: ready\n${id}data: ${JSON.stringify({ id: newest.id })}\n\n`)
      })
  }
}
