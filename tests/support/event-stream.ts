import http from 'node:http'
import { expect } from 'vitest'
import { cookieHeader, cookiesSet } from './cookies.js'
import { Client } from './test-app.js'

/** One server-sent event as heard: name, id and data (parsed), or a comment line. */
export interface HeardEvent {
  event: string
  id: string | null
  data: Record<string, unknown> | null
  comment?: string
}

/** An open `text/event-stream` answer, read as it arrives. */
export interface EventStream {
  status: number
  heard: HeardEvent[]
  /** Whether the server has ended the answer. */
  readonly ended: boolean
  /** Waits until an event matching `wanted` has been heard (a state, polled), and answers it. */
  next(wanted: (event: HeardEvent) => boolean, timeout?: number): Promise<HeardEvent>
  close(): void
}

/** The Cookie header of a person signed in (their session), for a request made outside supertest. */
export async function sessionCookie(baseUrl: string, email: string) {
  const client = new Client(baseUrl)
  const res = await client.signIn(email)
  if (res.status !== 200) throw new Error(`sign-in as ${email} failed: ${res.status}`)
  return cookieHeader(cookiesSet(res))
}

function parseBlock(block: string): HeardEvent | null {
  const event: HeardEvent = { event: 'message', id: null, data: null }
  let data = ''
  for (const line of block.split('\n')) {
    if (line.startsWith(':')) return { event: 'comment', id: null, data: null, comment: line.slice(1).trim() }
    const colon = line.indexOf(':')
    const field = colon < 0 ? line : line.slice(0, colon)
    const value = colon < 0 ? '' : line.slice(colon + 1).replace(/^ /, '')
    if (field === 'event') event.event = value
    else if (field === 'id') event.id = value
    else if (field === 'data') data += value
    else if (field === 'retry') return null
  }
  event.data = data ? (JSON.parse(data) as Record<string, unknown>) : null
  return event
}

/** Opens the board stream (or any event stream) at `url` with `cookie`, optionally resuming after `lastEventId`. */
export function openEventStream(url: string, cookie: string | null, lastEventId?: string): Promise<EventStream> {
  return new Promise((resolve, reject) => {
    const headers: Record<string, string> = { Accept: 'text/event-stream' }
    if (cookie) headers.Cookie = cookie
    if (lastEventId) headers['Last-Event-ID'] = lastEventId
    const req = http.get(url, { headers }, (res) => {
      const heard: HeardEvent[] = []
      let buffer = ''
      res.setEncoding('utf8')
      res.on('data', (chunk: string) => {
        buffer += chunk
        let end: number
        while ((end = buffer.indexOf('\n\n')) >= 0) {
          const parsed = parseBlock(buffer.slice(0, end))
          buffer = buffer.slice(end + 2)
          if (parsed) heard.push(parsed)
        }
      })
      let ended = false
      res.on('end', () => (ended = true))
      res.on('error', () => {})
      resolve({
        status: res.statusCode ?? 0,
        heard,
        get ended() {
          return ended
        },
        async next(wanted, timeout = 5000) {
          await expect.poll(() => heard.find(wanted), { timeout, interval: 10 }).toBeDefined()
          return heard.find(wanted)!
        },
        close: () => req.destroy(),
      })
    })
    req.on('error', (error) => {
      if (!req.destroyed) reject(error)
    })
  })
}
