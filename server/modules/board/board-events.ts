import type { BoardStreamData, BoardStreamEvent } from '../../../shared/schemas/board.js'
import type { LiveEvent } from '../../live/live-publisher.js'

/** The stream's event name for each kind of change: what changed, not how. */
export function streamEventName(type: string): BoardStreamEvent {
  if (type === 'hang-saved') return 'hang'
  if (type === 'arbor-counted') return 'arbor'
  if (type === 'lineset-locked-out' || type === 'lineset-released') return 'lockout'
  if (type.startsWith('ticket-')) return 'ticket'
  if (type === 'pre-run-check') return 'pre-run-check'
  return 'lineset'
}

/**
 * The id a board is sent, and sends back as Last-Event-ID when it reconnects: the event's id, and the horizon
 * (see `LiveEvent.horizon`) that makes resuming from it miss nothing, as `<id>.<horizon>`.
 */
export const wireId = (id: string, horizon: string | null | undefined) => (horizon ? `${id}.${horizon}` : id)

/** One server-sent event as written on the wire: name, id (when known) and its JSON data. */
export function streamMessage(
  event: Pick<LiveEvent, 'type' | 'linesetId' | 'eventId'>,
  horizon: string | null,
): string {
  const data: BoardStreamData = { id: event.eventId ?? null, type: event.type, linesetId: event.linesetId }
  const id = event.eventId ? `id: ${wireId(event.eventId, horizon)}\n` : ''
  return `event: ${streamEventName(event.type)}\n${id}data: ${JSON.stringify(data)}\n\n`
}

/** A stream message that carries only an id and tells the page to read the whole board again. */
export const resyncMessage = (id: string | null, horizon: string | null = null) =>
  `event: resync\n${id ? `id: ${wireId(id, horizon)}\n` : ''}data: ${JSON.stringify({ id })}\n\n`
