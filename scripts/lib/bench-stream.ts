// `npm run bench:api`'s stream line: how long a change made through the API takes to reach open boards.
import http from 'node:http'
import { performance } from 'node:perf_hooks'

export interface DeliveryFigures {
  streams: number
  changes: number
  /** From the write's answer to the event's arrival (0 when the event came first). */
  medianMs: number
  p95Ms: number
  maxMs: number
  /** From sending the write to the event's arrival: what a person making the change would see. */
  fromRequest: { medianMs: number; p95Ms: number; maxMs: number }
}

interface OpenStream {
  /** Resolves at the arrival of the next event named `name`. */
  nextEvent(name: string): Promise<number>
  close(): void
}

/** Opens the board stream as a browser's EventSource would (the session cookie, no compression). */
function openStream(url: string, cookie: string): Promise<OpenStream> {
  return new Promise((resolve, reject) => {
    const waiting: { name: string; arrived: (at: number) => void }[] = []
    const req = http.get(url, { headers: { Accept: 'text/event-stream', Cookie: cookie } }, (res) => {
      if (res.statusCode !== 200) return reject(new Error(`the board stream answered ${res.statusCode}`))
      let buffer = ''
      let ready = false
      res.setEncoding('utf8')
      res.on('data', (chunk: string) => {
        const at = performance.now()
        buffer += chunk
        let end: number
        while ((end = buffer.indexOf('\n\n')) >= 0) {
          const name = /^event: (.+)$/m.exec(buffer.slice(0, end))?.[1]
          buffer = buffer.slice(end + 2)
          if (name === 'ready' && !ready) {
            ready = true
            resolve({
              nextEvent: (wanted) => new Promise((arrived) => waiting.push({ name: wanted, arrived })),
              close: () => req.destroy(),
            })
          }
          const index = waiting.findIndex((wait) => wait.name === name)
          if (index >= 0) waiting.splice(index, 1)[0]!.arrived(at)
        }
      })
    })
    req.on('error', (error) => {
      if (!req.destroyed) reject(error)
    })
  })
}

const percentile = (sorted: number[], share: number) =>
  sorted[Math.min(sorted.length - 1, Math.floor(sorted.length * share))]!

/**
 * Opens `streamCount` board streams, then makes `changeCount` changes through the API one after another (a
 * lock-out, then its release, on one lineset) and times, for every stream, from the arrival of the write's
 * answer to the arrival of its event. Each change waits until every stream heard the one before.
 */
export async function measureDelivery(
  baseUrl: string,
  headers: { cookie: string; 'x-csrf-token': string },
  linesetId: string,
  streamCount: number,
  changeCount: number,
): Promise<DeliveryFigures> {
  const streams = await Promise.all(
    Array.from({ length: streamCount }, () => openStream(`${baseUrl}/api/v1/board/stream`, headers.cookie)),
  )
  const times: number[] = []
  const fromRequest: number[] = []
  try {
    for (let change = 0; change < changeCount; change++) {
      const heard = streams.map((stream) => stream.nextEvent('lockout'))
      const lock = change % 2 === 0
      const sent = performance.now()
      const answer = await fetch(`${baseUrl}/api/v1/linesets/${linesetId}/lockout`, {
        method: lock ? 'POST' : 'DELETE',
        headers: { ...headers, 'content-type': 'application/json' },
        body: lock ? JSON.stringify({ reason: 'Benchmark lock-out' }) : undefined,
      })
      await answer.arrayBuffer()
      const answered = performance.now()
      if (!answer.ok) throw new Error(`the change answered ${answer.status}`)
      for (const at of await Promise.all(heard)) {
        times.push(Math.max(0, at - answered))
        fromRequest.push(at - sent)
      }
    }
  } finally {
    for (const stream of streams) stream.close()
  }
  times.sort((a, b) => a - b)
  fromRequest.sort((a, b) => a - b)
  return {
    streams: streamCount,
    changes: changeCount,
    medianMs: percentile(times, 0.5),
    p95Ms: percentile(times, 0.95),
    maxMs: times[times.length - 1]!,
    fromRequest: {
      medianMs: percentile(fromRequest, 0.5),
      p95Ms: percentile(fromRequest, 0.95),
      maxMs: fromRequest[fromRequest.length - 1]!,
    },
  }
}
