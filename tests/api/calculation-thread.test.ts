import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { runCalculation } from '../../shared/engine/calculate.js'
import { MAX_WAITING_CALCULATIONS } from '../../server/modules/calculations/calculation-pool.js'
import { heaviestCalculation, worstCalculation } from '../../scripts/lib/worst-calculations.js'
import { seedVenue } from '../support/fixtures.js'
import { signedIn, startTestApp, type Client, type TestApp } from '../support/test-app.js'

// One calculation must never stall the server (issue 7, part 1). Calculations run on a thread of their own; these
// tests hold that thread so a worst-case calculation stays in flight for as long as they choose, then check what
// the server did meanwhile. Order and state are asserted, never a time.

let app: TestApp
let stageManager: Client
let flyOperator: Client
let linesetId: string

beforeAll(async () => {
  app = await startTestApp()
  const venue = await seedVenue(app.handle.context, 'alpha')
  stageManager = await signedIn(app.url, venue.emails['stage-manager'])
  flyOperator = await signedIn(app.url, venue.emails['fly-operator'])
  linesetId = venue.linesetId
})
afterAll(async () => {
  app.handle.calculations.release()
  await app.stop()
})

/** Waits (without a fixed delay) until the server has handed `count` calculations to the calculation thread. */
async function untilWaiting(count: number) {
  while (app.handle.calculations.waiting() < count) await new Promise((resolve) => setImmediate(resolve))
}

/** Sends a request now and records when it has been answered. */
function send<T>(request: PromiseLike<T>): { answered: boolean; response: Promise<T> } {
  const tracked = { answered: false, response: Promise.resolve(request) }
  tracked.response = tracked.response.then((res) => {
    tracked.answered = true
    return res
  })
  return tracked
}

describe('a worst-case calculation in flight', () => {
  it('when the worst accepted calculation is running, then other requests are answered before it', async () => {
    const worst = worstCalculation('imperial')
    app.handle.calculations.hold()
    const slow = send(stageManager.post('/api/v1/calculations', worst))
    await untilWaiting(1)

    const others = await Promise.all([stageManager.get('/api/v1/session'), stageManager.get('/api/v1/linesets')])
    expect(others.map((res) => res.status)).toEqual([200, 200])
    expect(slow.answered).toBe(false)

    app.handle.calculations.release()
    const res = await slow.response
    expect(res.status).toBe(200)
    expect(res.body).toEqual(JSON.parse(JSON.stringify((runCalculation(worst) as { result: unknown }).result)))
  })

  it('when a hang is saved, then its engine runs on the calculation thread and other requests are answered meanwhile', async () => {
    app.handle.calculations.hold()
    const saving = send(
      flyOperator.post(`/api/v1/linesets/${linesetId}/hangs`, {
        title: 'Held save',
        basedOnRevision: null,
        unitSystem: 'imperial',
        items: [{ label: 'Sandbag', category: 'hardware', weight: 25, at: 20 }],
      }),
    )
    await untilWaiting(1)

    const others = await Promise.all([stageManager.get('/api/v1/session'), stageManager.get('/api/v1/venue')])
    expect(others.map((res) => res.status)).toEqual([200, 200])
    expect(saving.answered).toBe(false)

    app.handle.calculations.release()
    const res = await saving.response
    expect(res.status).toBe(201)
    expect(res.body.revision).toBe(1)
  })

  it('when several of the heaviest calculations arrive at once, then every one is answered, in full', async () => {
    const heaviest = heaviestCalculation('metric')
    const answers = await Promise.all(
      Array.from({ length: 4 }, () => stageManager.post('/api/v1/calculations', heaviest)),
    )
    expect(answers.map((res) => res.status)).toEqual([200, 200, 200, 200])
    expect(new Set(answers.map((res) => JSON.stringify(res.body))).size).toBe(1)
  })

  it('when more calculations wait than the thread takes, then the extra one is refused with 503 and the rest finish', async () => {
    const small = { units: 'imperial', kind: 'hemp-single', batten: { length: 4, weightPerLength: 1, pickPoints: [2] } }
    app.handle.calculations.hold()
    const queued = Array.from({ length: MAX_WAITING_CALCULATIONS }, () =>
      send(stageManager.post('/api/v1/calculations', small)),
    )
    await untilWaiting(MAX_WAITING_CALCULATIONS)
    const extra = await stageManager.post('/api/v1/calculations', small)
    expect(extra.status).toBe(503)
    expect(extra.body.error.code).toBe('calculations_busy')
    expect(queued.some((request) => request.answered)).toBe(false)

    app.handle.calculations.release()
    const statuses = await Promise.all(queued.map(async (request) => (await request.response).status))
    expect(statuses.every((status) => status === 200)).toBe(true)
  })
})
