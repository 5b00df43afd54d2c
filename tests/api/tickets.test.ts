import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { VenueFixture } from '../support/fixtures.js'
import type { Client, TestApp } from '../support/test-app.js'
import { startTwoVenues } from '../support/venue-suite.js'
import { databaseFingerprint } from '../support/database-fingerprint.js'
import { hungLineset, operatingStatusOf, saveRevision, stockLine } from '../support/tickets.js'

// The fixture's "Full" brick weighs 20 lb and the house owns 100; a 200 lb drop on the sample set plans five
// of them, leaving 8.8 lb batten heavy (see tests/support/tickets.ts; invented test data).
let app: TestApp
let alpha: VenueFixture
let admin: Client
let director: Client
let operator: Client
let stageManager: Client
let otherVenue: Client

beforeAll(async () => {
  const venues = await startTwoVenues()
  ;({ app, alpha } = venues)
  admin = venues.atAlpha.administrator
  director = venues.atAlpha['technical-director']
  operator = venues.atAlpha['fly-operator']
  stageManager = venues.atAlpha['stage-manager']
  otherVenue = venues.atBeta['fly-operator']
})
afterAll(() => app.stop())

let nextNumber = 500
const hung = (weight = 200, overrides = {}) => hungLineset(director, operator, nextNumber++, weight, overrides)
const open = (client: Client, hangId: string) => client.post('/api/v1/tickets', { hangId })
const act = (client: Client, id: string, step: string, body: object) =>
  client.post(`/api/v1/tickets/${id}/${step}`, body)

async function openedTicket(weight = 200) {
  const { id: linesetId, hang } = await hung(weight)
  const res = await open(operator, hang.id).expect(201)
  return { linesetId, hang, ticket: res.body }
}

describe('opening a ticket', () => {
  it('when a fly operator asks for the latest revision, then the plan, the arbor after and the expected out of balance come back', async () => {
    const { id: linesetId, hang } = await hung()
    const res = await open(operator, hang.id)
    expect(res.status).toBe(201)
    expect(res.body).toMatchObject({
      state: 'requested',
      version: 0,
      linesetId,
      hangId: hang.id,
      changes: [{ brickTypeId: alpha.brickTypeId, name: 'Full', count: 5 }],
      arborAfter: [{ brickTypeId: alpha.brickTypeId, count: 5 }],
      hang: { revision: 1 },
      openedBy: { id: alpha.members['fly-operator'].id },
      shortfall: [],
    })
    // 200 lb drop + 108.8 lb batten (40 ft x 2.72 lb/ft) = 308.8 lb; arbor 90 + 110 + 5 x 20 = 300 lb.
    expect(res.body.expectedOutOfBalance).toBeCloseTo(8.8, 6)
    // Its arbor is still empty: the set reads out of balance (do not operate) while the change waits.
    expect(await operatingStatusOf(stageManager, linesetId)).toBe('out-of-balance')
  })

  it('when weight comes off, then the change is negative and the arbor after holds less', async () => {
    const { id: linesetId } = await hung()
    await director.put(`/api/v1/linesets/${linesetId}/arbor`, {
      version: 0,
      bricks: [{ brickTypeId: alpha.brickTypeId, count: 5 }],
    })
    const lighter = await saveRevision(operator, linesetId, 1, 100)
    const res = await open(operator, lighter.id).expect(201)
    expect(res.body.changes).toEqual([{ brickTypeId: alpha.brickTypeId, name: 'Full', count: -5 }])
    expect(res.body.arborAfter).toEqual([{ brickTypeId: alpha.brickTypeId, count: 0 }])
  })

  it('when the revision is not the latest, then it answers 409 naming the latest', async () => {
    const { id: linesetId, hang } = await hung()
    await saveRevision(operator, linesetId, 1, 250)
    const res = await open(operator, hang.id)
    expect(res.status).toBe(409)
    expect(res.body.error).toMatchObject({ code: 'not_latest_revision' })
    expect(res.body.error.message).toMatch(/revision 2 is/)
  })

  it('when the lineset already has an open ticket, then a second is refused with 409', async () => {
    const { hang } = await openedTicket()
    const res = await open(director, hang.id)
    expect(res.status).toBe(409)
    expect(res.body.error.code).toBe('open_ticket_exists')
  })

  it('when the lineset is being loaded, then a ticket for a new revision is refused in words until it is done', async () => {
    const { linesetId, ticket } = await openedTicket()
    await act(admin, ticket.id, 'approve', { version: 0 }).expect(200)
    await act(operator, ticket.id, 'start-loading', { version: 1 }).expect(200)
    const next = await saveRevision(operator, linesetId, 1, 220)
    const res = await open(operator, next.id)
    expect(res.status).toBe(409)
    expect(res.body.error).toMatchObject({ code: 'lineset_loading' })
    expect(res.body.error.message).toMatch(/being loaded now/)
  })

  it('when the lineset is locked out or out of service, then it answers 409', async () => {
    const { id: linesetId, hang } = await hung()
    await director.post(`/api/v1/linesets/${linesetId}/lockout`, { reason: 'Rope lock sticks' }).expect(201)
    const locked = await open(operator, hang.id)
    expect(locked.status).toBe(409)
    expect(locked.body.error.code).toBe('locked_out')
    const { hang: other } = await hung(200, { status: 'out-of-service' })
    const out = await open(operator, other.id)
    expect(out.status).toBe(409)
    expect(out.body.error.code).toBe('out_of_service')
  })

  it('when the lineset is not a counterweight set, then it answers 409', async () => {
    const { hang } = await hung(50, {
      kind: 'hemp-multi',
      arborEmptyWeight: null,
      arborCapacity: null,
      pipeWeight: null,
    })
    const res = await open(operator, hang.id)
    expect(res.status).toBe(409)
    expect(res.body.error.code).toBe('not_counterweight')
  })

  it('when the hang would tip its batten, then no ticket opens and the 409 says why in words', async () => {
    // Two lines at 0 and 10 ft under a 40 ft batten: the centre of load (20 ft) lies beyond the line at 10 ft.
    const { id: linesetId, hang } = await hung(200, { pickPoints: [0, 10] })
    const res = await open(operator, hang.id)
    expect(res.status).toBe(409)
    expect(res.body.error.code).toBe('batten_tips')
    expect(res.body.error.message).toMatch(
      /^No ticket can open on lineset \d+: The batten cannot hang level: the centre of its load, at 20 ft, lies beyond the end line at 10 ft, so it tips\. No brick plan is offered/,
    )
    expect(await operatingStatusOf(stageManager, linesetId)).not.toBe('awaiting-approval')
  })

  it('when the hang has a finding that says stop, then no ticket opens and the 409 gives the findings in words', async () => {
    // 200 lb drop + 108.8 lb of batten = 308.8 lb against a rated load of 250 lb (invented test data).
    const { id: linesetId, hang } = await hung(200, { ratedLoad: 250 })
    const saved = (await operator.get(`/api/v1/linesets/${linesetId}/hangs/${hang.id}`).expect(200)).body
    const stops = saved.result.checks.filter((check: { level: string }) => check.level === 'danger')
    expect(stops.map((check: { code: string }) => check.code)).toContain('over-rated-load')
    const before = (await director.get('/api/v1/tickets').expect(200)).body.length
    const res = await open(operator, hang.id)
    expect(res.status).toBe(409)
    expect(res.body.error.code).toBe('hang_has_dangers')
    expect(res.body.error.message).toMatch(
      /^No ticket can open on lineset \d+ while its hang has (a finding that says|\d+ findings that say) stop: /,
    )
    for (const stop of stops) expect(res.body.error.message).toContain(stop.message)
    expect((await director.get('/api/v1/tickets').expect(200)).body).toHaveLength(before)
    expect(await operatingStatusOf(stageManager, linesetId)).not.toBe('awaiting-approval')
  })

  it("when another venue's hang is named, then it answers 404; a stage manager is refused with 403", async () => {
    const { hang } = await hung()
    expect((await open(otherVenue, hang.id)).status).toBe(404)
    expect((await open(stageManager, hang.id)).status).toBe(403)
    expect((await open(operator, 'not-a-uuid')).body.error.fields).toHaveProperty('hangId')
  })
})

describe('deciding', () => {
  it('when a fly operator tries to approve, then 403; when the opener is a director, then they cannot decide it', async () => {
    const { ticket } = await openedTicket()
    expect((await act(operator, ticket.id, 'approve', { version: 0 })).status).toBe(403)
    expect((await act(stageManager, ticket.id, 'decline', { version: 0, comment: 'No' })).status).toBe(403)
    const { hang } = await hung()
    const own = (await open(director, hang.id).expect(201)).body
    const res = await act(director, own.id, 'approve', { version: 0 })
    expect(res.status).toBe(403)
    expect(res.body.error.message).toMatch(/Nobody decides a ticket they opened/)
    expect((await act(admin, own.id, 'approve', { version: 0 })).status).toBe(200)
  })

  it('when a ticket waits on a hang saved with a finding that says stop, then approval is refused and nothing moves', async () => {
    const { ticket, hang } = await openedTicket()
    // As a ticket opened before tickets were refused on such hangs: its revision's stored result says stop.
    const stop = {
      code: 'line-over-limit',
      level: 'danger',
      message: 'Line 3 carries 1,527 lb, over its working load limit',
    }
    await app.handle.db.sequelize.query(
      `UPDATE hangs SET calculation_result = jsonb_set(calculation_result, '{checks}',
              (calculation_result->'checks') || $2::jsonb) WHERE id = $1`,
      { bind: [hang.id, JSON.stringify([stop])] },
    )
    const before = await stockLine(director, alpha.brickTypeId)
    const res = await act(director, ticket.id, 'approve', { version: 0 })
    expect(res.status).toBe(409)
    expect(res.body.error.code).toBe('hang_has_dangers')
    expect(res.body.error.message).toContain(`${stop.message}.`)
    expect((await director.get(`/api/v1/tickets/${ticket.id}`).expect(200)).body).toMatchObject({
      state: 'requested',
      version: 0,
    })
    expect(await stockLine(director, alpha.brickTypeId)).toEqual(before)
    expect((await act(director, ticket.id, 'decline', { version: 0, comment: 'Over the line limit' })).status).toBe(200)
  })

  it('when a director approves, then the bricks are reserved, the opener is mailed with the link, and a second decision names the state', async () => {
    const { linesetId, ticket } = await openedTicket()
    const before = await stockLine(director, alpha.brickTypeId)
    const res = await act(director, ticket.id, 'approve', { version: 0, comment: 'Go ahead after the matinee' })
    expect(res.status).toBe(200)
    expect(res.body).toMatchObject({
      state: 'approved',
      version: 1,
      decidedBy: { id: alpha.members['technical-director'].id },
      comments: [{ kind: 'approved', text: 'Go ahead after the matinee' }],
    })
    const after = await stockLine(director, alpha.brickTypeId)
    expect(after.reserved - before.reserved).toBe(5)
    expect(after.inStorage - before.inStorage).toBe(-5)
    expect(after.owned).toBe(after.onArbors + after.reserved + after.inStorage)
    const mail = await app.mailbox.latestTo(alpha.emails['fly-operator'])
    expect(mail.subject).toMatch(/approved/)
    expect(mail.text).toContain(`${app.config.publicUrl}/tickets/${ticket.id}`)
    expect(mail.text).toContain('Go ahead after the matinee')
    const again = await act(admin, ticket.id, 'decline', { version: 1, comment: 'Too late' })
    expect(again.status).toBe(409)
    expect(again.body.error).toMatchObject({ code: 'ticket_state', fields: { state: 'approved' } })
    expect(again.body.error.message).toBe(
      'This ticket has already been approved. Only a ticket awaiting a decision can be declined.',
    )
    // An approval changes nothing at the rail: the empty arbor is still short of the hang until it is loaded.
    expect(await operatingStatusOf(operator, linesetId)).toBe('out-of-balance')
  })

  it('when declining without a comment, then 400 names the comment; with one, the opener reads it', async () => {
    const { ticket } = await openedTicket()
    const bare = await act(director, ticket.id, 'decline', { version: 0 })
    expect(bare.status).toBe(400)
    expect(bare.body.error.fields).toHaveProperty('comment')
    const res = await act(director, ticket.id, 'decline', { version: 0, comment: 'Wrong revision for tonight' })
    expect(res.status).toBe(200)
    expect(res.body.state).toBe('declined')
    const mail = await app.mailbox.latestTo(alpha.emails['fly-operator'])
    expect(mail.subject).toMatch(/declined/)
    expect(mail.text).toContain('Wrong revision for tonight')
  })

  it('when a stale version is sent, then it answers 409 and nothing changes', async () => {
    const { ticket } = await openedTicket()
    const res = await act(director, ticket.id, 'approve', { version: 7 })
    expect(res.status).toBe(409)
    expect(res.body.error.code).toBe('stale_version')
    expect((await director.get(`/api/v1/tickets/${ticket.id}`)).body.state).toBe('requested')
  })

  it('when storage cannot cover the plan, then the shortfall shows before deciding and approval is 409 naming the brick type', async () => {
    const { ticket } = await openedTicket()
    const line = await stockLine(director, alpha.brickTypeId)
    // Take all but three bricks out of storage by lowering what the house owns.
    const type = (await director.get('/api/v1/brick-types')).body.find(
      (t: { id: string }) => t.id === alpha.brickTypeId,
    )
    await director
      .put(`/api/v1/brick-types/${alpha.brickTypeId}`, { ...type, quantityOwned: line.owned - line.inStorage + 3 })
      .expect(200)
    const read = await stageManager.get(`/api/v1/tickets/${ticket.id}`).expect(200)
    expect(read.body.shortfall).toEqual([{ brickTypeId: alpha.brickTypeId, name: 'Full', missing: 2 }])
    const res = await act(director, ticket.id, 'approve', { version: 0 })
    expect(res.status).toBe(409)
    expect(res.body.error.code).toBe('not_enough_bricks')
    expect(res.body.error.message).toMatch(/"Full".*2 missing/)
    expect((await director.get(`/api/v1/tickets/${ticket.id}`)).body).toMatchObject({ state: 'requested', version: 0 })
    await director.put(`/api/v1/brick-types/${alpha.brickTypeId}`, { ...type, version: type.version + 1 }).expect(200)
  })
})

describe('withdrawing', () => {
  it('when someone other than the opener withdraws, then 403; the opener withdraws an approved ticket and its bricks go back', async () => {
    const { ticket } = await openedTicket()
    expect((await act(director, ticket.id, 'withdraw', { version: 0 })).status).toBe(403)
    await act(director, ticket.id, 'approve', { version: 0 }).expect(200)
    const held = await stockLine(director, alpha.brickTypeId)
    const res = await act(operator, ticket.id, 'withdraw', { version: 1 })
    expect(res.status).toBe(200)
    expect(res.body.state).toBe('withdrawn')
    const after = await stockLine(director, alpha.brickTypeId)
    expect(after.reserved).toBe(held.reserved - 5)
    expect(after.inStorage).toBe(held.inStorage + 5)
  })
})

describe('a lineset with a ticket still open', () => {
  it('when it is retired with a ticket open, then 409 open_ticket writes nothing; once withdrawn, it retires', async () => {
    const { linesetId, ticket } = await openedTicket()
    // The opening mails every technical director after commit: let that settle before taking the fingerprint.
    await app.handle.context.outbox.idle()
    const before = await databaseFingerprint(app.handle.db.sequelize)
    const refused = await admin.delete(`/api/v1/linesets/${linesetId}`)
    expect(refused.status).toBe(409)
    expect(refused.body.error.code).toBe('open_ticket')
    expect(refused.body.error.message).toMatch(/change ticket still open/)
    expect(await databaseFingerprint(app.handle.db.sequelize)).toBe(before)
    await act(operator, ticket.id, 'withdraw', { version: 0 }).expect(200)
    expect((await admin.delete(`/api/v1/linesets/${linesetId}`)).status).toBe(204)
  })
})

describe('loading', () => {
  it('when the crew starts and completes, then arbor, stock, ticket, status and ledger change together', async () => {
    const { linesetId, ticket } = await openedTicket()
    await act(director, ticket.id, 'approve', { version: 0 }).expect(200)
    expect((await act(stageManager, ticket.id, 'start-loading', { version: 1 })).status).toBe(403)
    const started = await act(operator, ticket.id, 'start-loading', { version: 1 })
    expect(started.body.state).toBe('loading')
    expect(await operatingStatusOf(stageManager, linesetId)).toBe('loading')
    const before = await stockLine(director, alpha.brickTypeId)
    const done = await act(operator, ticket.id, 'complete', {
      version: 2,
      loaded: [{ brickTypeId: alpha.brickTypeId, count: 6 }],
      feltBalance: 'balanced',
      note: 'One more brick felt right',
      differsFromPlan: true,
    })
    expect(done.status).toBe(200)
    expect(done.body).toMatchObject({ state: 'loaded', feltBalance: 'balanced' })
    expect(done.body.bricks).toEqual([expect.objectContaining({ count: 5, loaded: 6, reserved: 0 })])
    const arbor = await operator.get(`/api/v1/linesets/${linesetId}/arbor`).expect(200)
    expect(arbor.body.bricks).toEqual([{ brickTypeId: alpha.brickTypeId, name: 'Full', count: 6 }])
    const after = await stockLine(director, alpha.brickTypeId)
    expect(after.reserved).toBe(before.reserved - 5)
    expect(after.onArbors).toBe(before.onArbors + 6)
    expect(after.inStorage).toBe(before.inStorage - 1)
    expect(after.owned).toBe(after.onArbors + after.reserved + after.inStorage)
    // Six bricks leave the set 11.2 lb arbor heavy, beyond the 10 lb tolerance, whatever was felt.
    expect(await operatingStatusOf(stageManager, linesetId)).toBe('out-of-balance')
    const events = (await operator.get(`/api/v1/linesets/${linesetId}/events`).expect(200)).body.events
    expect(events.slice(0, 4).map((event: { summary: string }) => event.summary)).toEqual([
      'Loaded for hang revision 1, “Drop of 200 lb”: Full 0 → 6; felt balanced at the rail; not the plan: 6 × Full recorded, the plan was 5 (One more brick felt right)',
      'Loading started for hang revision 1, “Drop of 200 lb”: do not operate',
      'Change to hang revision 1, “Drop of 200 lb” approved, bricks held in reserve',
      'Asked for the weight change to hang revision 1, “Drop of 200 lb”: 5 × Full on',
    ])
  })

  it('when completion asks for more than storage holds, then 409 names the field and nothing is written', async () => {
    const { ticket } = await openedTicket()
    await act(director, ticket.id, 'approve', { version: 0 }).expect(200)
    await act(operator, ticket.id, 'start-loading', { version: 1 }).expect(200)
    const res = await act(operator, ticket.id, 'complete', {
      version: 2,
      loaded: [{ brickTypeId: alpha.brickTypeId, count: 5000 }],
      feltBalance: 'batten-heavy',
      differsFromPlan: true,
    })
    expect(res.status).toBe(409)
    expect(res.body.error).toMatchObject({ code: 'not_enough_bricks' })
    expect(res.body.error.fields).toHaveProperty(['loaded.0.count'])
    expect((await operator.get(`/api/v1/tickets/${ticket.id}`)).body.state).toBe('loading')
  })

  it('when a completion carries bad counts or an unknown type, then 400 names each field', async () => {
    const { ticket } = await openedTicket()
    const negative = await act(operator, ticket.id, 'complete', {
      version: 0,
      loaded: [{ brickTypeId: alpha.brickTypeId, count: -1 }],
      feltBalance: 'balanced',
    })
    expect(negative.body.error.fields).toHaveProperty(['loaded.0.count'])
    const fractional = await act(operator, ticket.id, 'complete', {
      version: 0,
      loaded: [{ brickTypeId: alpha.brickTypeId, count: 1.5 }],
      feltBalance: 'sideways',
    })
    expect(Object.keys(fractional.body.error.fields).sort()).toEqual(['feltBalance', 'loaded.0.count'])
    const wrongState = await act(operator, ticket.id, 'complete', { version: 0, loaded: [], feltBalance: 'balanced' })
    expect(wrongState.status).toBe(409)
    expect(wrongState.body.error.message).toMatch(/awaiting a decision/)
  })
})

describe('reading tickets', () => {
  it('when any role lists by state, then only that state comes back, with lineset and hang named; another venue sees none', async () => {
    const { ticket } = await openedTicket()
    for (const client of [admin, director, operator, stageManager]) {
      const res = await client.get('/api/v1/tickets?state=requested').expect(200)
      expect(res.body.every((t: { state: string }) => t.state === 'requested')).toBe(true)
      expect(res.body.find((t: { id: string }) => t.id === ticket.id)).toMatchObject({
        lineset: { number: expect.any(Number) },
        hang: { revision: 1, title: 'Drop of 200 lb' },
      })
    }
    expect((await otherVenue.get('/api/v1/tickets')).body).toEqual([])
    expect((await otherVenue.get(`/api/v1/tickets/${ticket.id}`)).status).toBe(404)
    expect((await operator.get('/api/v1/tickets?state=lost')).body.error.fields).toHaveProperty('state')
  })

  it('when a ticket is opened, then every technical director of the venue is mailed a link to it', async () => {
    const { ticket } = await openedTicket()
    const mail = await app.mailbox.latestTo(alpha.emails['technical-director'])
    expect(mail.to).toEqual([alpha.emails['technical-director']])
    expect(mail.subject).toMatch(/waiting for your decision/)
    expect(mail.text).toContain(`${app.config.publicUrl}/tickets/${ticket.id}`)
  })
})
