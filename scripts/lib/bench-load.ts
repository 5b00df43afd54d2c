import autocannon from 'autocannon'

export interface LoadTarget {
  name: string
  url: string
  method?: 'GET' | 'POST'
  headers?: Record<string, string>
  body?: string
}

export interface LoadFigures {
  name: string
  requestsPerSecond: number
  medianMs: number
  p95Ms: number
  /** Answers that were not 2xx, and socket errors or timeouts: a figure with either is not a fair one. */
  failures: number
  bytesPerAnswer: number
  /** CPU milliseconds per answer of each process `driveLoad` was given to watch (the server, the database). */
  cpuMsPerAnswer: number[]
}

const percentile = (sorted: number[], share: number) =>
  sorted.length === 0 ? NaN : sorted[Math.min(sorted.length - 1, Math.floor(sorted.length * share))]!

/**
 * Drives one target with autocannon (10 connections, loopback) for `seconds`, after a warm-up of its own.
 * Median and p95 come from every answer's own time (autocannon's `response` event), not from its summary,
 * which reports p97.5 and p99 but no p95.
 */
export async function driveLoad(
  target: LoadTarget,
  seconds: number,
  cpuCounters: () => number[] = () => [],
  warmUpSeconds = 2,
): Promise<LoadFigures> {
  const options = {
    url: target.url,
    method: target.method ?? 'GET',
    headers: target.headers,
    body: target.body,
    connections: 10,
  }
  await autocannon({ ...options, duration: warmUpSeconds })
  const times: number[] = []
  const cpuBefore = cpuCounters()
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const run = autocannon({ ...options, duration: seconds }, (error, done) => (error ? reject(error) : resolve(done)))
    run.on('response', (_client, _status, _bytes, responseTime) => times.push(responseTime))
  })
  const cpuAfter = cpuCounters()
  times.sort((a, b) => a - b)
  return {
    name: target.name,
    requestsPerSecond: result.requests.total / seconds,
    medianMs: percentile(times, 0.5),
    p95Ms: percentile(times, 0.95),
    failures: result.non2xx + result.errors + result.timeouts,
    bytesPerAnswer: result.requests.total ? result.throughput.total / result.requests.total : 0,
    cpuMsPerAnswer: cpuAfter.map((after, k) => (after - cpuBefore[k]!) / Math.max(1, result.requests.total)),
  }
}
