/** Median and slowest of one timed read right after each change, per path. */
export interface AfterChangeFigures {
  changes: number
  byPath: Record<string, { medianMs: number; maxMs: number }>
}

/**
 * The list and the board are stored per venue and served until the venue's data changes: what the load targets
 * measure is that stored copy. This times the other case, one request at a time: a change through the API (a
 * lock-out, then its release), then each path read once, which computes, compresses and stores it afresh.
 */
export async function measureFirstReadsAfterChange(
  baseUrl: string,
  headers: Record<string, string>,
  linesetId: string,
  paths: string[],
  changeCount: number,
): Promise<AfterChangeFigures> {
  const times = new Map<string, number[]>(paths.map((path) => [path, []]))
  for (let change = 0; change < changeCount; change++) {
    const lock = change % 2 === 0
    const answer = await fetch(`${baseUrl}/api/v1/linesets/${linesetId}/lockout`, {
      method: lock ? 'POST' : 'DELETE',
      headers: { ...headers, 'content-type': 'application/json' },
      body: lock ? JSON.stringify({ reason: 'Benchmark lock-out' }) : undefined,
    })
    await answer.arrayBuffer()
    if (!answer.ok) throw new Error(`the change answered ${answer.status}`)
    for (const path of paths) {
      const sent = performance.now()
      const read = await fetch(`${baseUrl}${path}`, { headers: { ...headers, 'accept-encoding': 'identity' } })
      await read.arrayBuffer()
      if (!read.ok) throw new Error(`${path} answered ${read.status}`)
      times.get(path)!.push(performance.now() - sent)
    }
  }
  const byPath: AfterChangeFigures['byPath'] = {}
  for (const [path, taken] of times) {
    taken.sort((a, b) => a - b)
    byPath[path] = { medianMs: taken[Math.floor(taken.length / 2)]!, maxMs: taken.at(-1)! }
  }
  return { changes: changeCount, byPath }
}
