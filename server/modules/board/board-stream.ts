import type { Request, RequestHandler, Response } from 'express'
import { memberContext, type AppContext } from '../../context.js'
import type { LiveHub } from '../../live/live-hub.js'
import type { LiveEvent } from '../../live/live-publisher.js'
import { streamStillAllowed } from './board-access.js'
import { resyncMessage, streamMessage } from './board-events.js'
import { missedEvents, newestEventId } from './board-replay.js'

const EVENT_ID = /^[1-9]\d{0,17}$/

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
    let lastId: string | null = null
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
    const noteId = (id: string | undefined) => {
      if (id && (lastId === null || BigInt(id) > BigInt(lastId))) lastId = id
    }
    const catchUp = async (afterId: string) => {
      const missed = await missedEvents(ctx, afterId)
      if (missed.tooMany) {
        const newest = await newestEventId(ctx)
        replayed = new Set()
        noteId(newest ?? undefined)
        return write(resyncMessage(newest))
      }
      replayed = new Set(missed.events.map((event) => event.eventId))
      for (const event of missed.events) {
        write(streamMessage(event))
        noteId(event.eventId)
      }
    }
    const live = (event: LiveEvent) =>
      later(() => {
        if (event.eventId && replayed.delete(event.eventId)) return
        write(streamMessage(event))
        noteId(event.eventId)
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
    unsubscribe = await hub.subscribe({
      venueId: ctx.actor.venueId,
      onEvent: live,
      // Listening was lost for a while: whatever happened meanwhile comes from the database.
      onGap: () => later(() => (lastId ? catchUp(lastId) : write(resyncMessage(null)))),
      onClose: end,
    })
    if (!open) return unsubscribe()

    const from = req.get('Last-Event-ID')
    if (from && EVENT_ID.test(from)) later(() => catchUp(from))
    else
      later(async () => {
        const newest = await newestEventId(ctx)
        noteId(newest ?? undefined)
        const id = newest ? `id: ${newest}\n` : ''
        write(`event: ready\n${id}data: ${JSON.stringify({ id: newest })}\n\n`)
      })
  }
}
