import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { LatestPreRunCheck, PreRunCheck } from '../../shared/schemas/board.js'
import { openEventStream, sessionCookie } from '../support/event-stream.js'
import type { VenueFixture } from '../support/fixtures.js'
import type { Client, TestApp } from '../support/test-app.js'
import { hungLineset } from '../support/tickets.js'
import { startTwoVenues } from '../support/venue-suite.js'

let app: TestApp
let alpha: VenueFixture
let director: Client
let operator: Client
let stageManager: Client
let betaManager: Client

beforeAll(async () => {
  const venues = await startTwoVenues()
  ;({ app, alpha } = venues)
  director = venues.atAlpha['technical-director']
  operator = venues.atAlpha['fly-operator']
  stageManager = venues.atAlpha['stage-manager']
  betaManager = venues.atBeta['stage-manager']
})
afterAll(() => app.stop())

describe('pre-run checks', () => {
  it('when the stage manager records a check, then it counts the ready linesets and names those not ready, as they are now', async () => {
    const { id: lockedId } = await hungLineset(director, operator, 700, 100)
    await director.post(`/api/v1/linesets/${lockedId}/lockout`, { reason: 'Pulley cracked' }).expect(201)
    const linesets = (await stageManager.get('/api/v1/linesets').expect(200)).body as {
      id: string
      operatingStatus: string
    }[]
    const notReady = linesets.filter((lineset) => lineset.operatingStatus !== 'ready').map((lineset) => lineset.id)

    const res = await stageManager.post('/api/v1/pre-run-checks', { note: 'Half hour call' }).expect(201)
    const check = res.body as PreRunCheck
    expect(check).toMatchObject({ note: 'Half hour call', linesetCount: linesets.length, productionId: null })
    expect(check.readyCount).toBe(linesets.length - notReady.length)
    expect(check.notReady.map((lineset) => lineset.id).sort()).toEqual(notReady.sort())
    expect(check.notReady.find((lineset) => lineset.id === lockedId)).toMatchObject({
      number: 700,
      operatingStatus: 'locked-out',
    })
    expect(check.by!.id).toBe(alpha.members['stage-manager'].id)

    // The record keeps the moment: releasing the lock-out afterwards changes nothing in it.
    await director.delete(`/api/v1/linesets/${lockedId}/lockout`, { reason: 'Checked and cleared' }).expect(204)
    const [listed] = (await stageManager.get('/api/v1/pre-run-checks?limit=1').expect(200)).body as PreRunCheck[]
    expect(listed).toEqual(check)
  })

  it('when a fly operator records a check, then it is refused with 403 and nothing is written', async () => {
    const before = (await director.get('/api/v1/pre-run-checks').expect(200)).body as PreRunCheck[]
    const res = await operator.post('/api/v1/pre-run-checks', { note: 'Mine' })
    expect(res.status).toBe(403)
    expect((await director.get('/api/v1/pre-run-checks').expect(200)).body).toEqual(before)
  })

  it('when changes follow a check, then the technical director sees the check and every change since it, newest first', async () => {
    const check = (await director.post('/api/v1/pre-run-checks', {}).expect(201)).body as PreRunCheck
    await director.post(`/api/v1/linesets/${alpha.linesetId}/lockout`, { reason: 'Loose clamp' }).expect(201)
    await director.delete(`/api/v1/linesets/${alpha.linesetId}/lockout`, { reason: 'Checked and cleared' }).expect(204)
    const latest = (await director.get('/api/v1/pre-run-checks/latest').expect(200)).body as LatestPreRunCheck
    expect(latest.check!.id).toBe(check.id)
    expect(latest.changesSince.map((change) => change.type)).toEqual(['lineset-released', 'lineset-locked-out'])
    expect(latest.changesSince[1]).toMatchObject({ linesetId: alpha.linesetId, summary: expect.any(String) })
    expect(latest.moreChanges).toBe(false)
    const board = (await director.get('/api/v1/board').expect(200)).body
    expect(board.lastCheck.id).toBe(check.id)
  })

  it('when a check is recorded, then the venue open boards hear a pre-run-check event with its id', async () => {
    const open = await openEventStream(
      `${app.url}/api/v1/board/stream`,
      await sessionCookie(app.url, alpha.emails['stage-manager']),
    )
    try {
      await open.next((event) => event.event === 'ready')
      const check = (await stageManager.post('/api/v1/pre-run-checks', {}).expect(201)).body as PreRunCheck
      const heard = await open.next((event) => event.event === 'pre-run-check')
      expect(heard.data!.id).toBe(check.id)
      expect(heard.id).toMatch(new RegExp(`^${check.id}\\.\\d+$`)) // the id, then the horizon to resume from
    } finally {
      open.close()
    }
  })

  it('when another venue lists its checks, then it sees none of this venue, and a production of this venue is a 404', async () => {
    expect((await betaManager.get('/api/v1/pre-run-checks').expect(200)).body).toEqual([])
    expect((await betaManager.get('/api/v1/pre-run-checks/latest').expect(200)).body.check).toBeNull()
    const production = (
      await director
        .post('/api/v1/productions', {
          name: 'Spring Gala',
          firstPerformance: '2027-03-01',
          lastPerformance: '2027-03-20',
          state: 'planning',
        })
        .expect(201)
    ).body
    expect((await betaManager.post('/api/v1/pre-run-checks', { productionId: production.id })).status).toBe(404)
    const forShow = await stageManager.post('/api/v1/pre-run-checks', { productionId: production.id }).expect(201)
    expect(forShow.body).toMatchObject({ productionName: 'Spring Gala', linesetCount: 0, readyCount: 0 })
  })

  it('when the limit is out of range, then it answers 400 naming it', async () => {
    const res = await stageManager.get('/api/v1/pre-run-checks?limit=500')
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toHaveProperty('limit')
  })
})
