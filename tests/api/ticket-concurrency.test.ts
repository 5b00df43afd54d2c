import { QueryTypes } from 'sequelize'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { seedVenue, type VenueFixture } from '../support/fixtures.js'
import { signedIn, startTestApp, type Client, type TestApp } from '../support/test-app.js'
import { hungLineset } from '../support/tickets.js'

// Many decisions and completions at once, each request on its own connection. The fixture's "Full" brick
// weighs 20 lb and the house owns 100; a 120 lb drop on the sample set plans one brick (invented test data).
let app: TestApp
let alpha: VenueFixture
let admin: Client
let director: Client
let operator: Client

beforeAll(async () => {
  app = await startTestApp()
  alpha = await seedVenue(app.handle.context, 'alpha')
  admin = await signedIn(app.url, alpha.emails.administrator)
  director = await signedIn(app.url, alpha.emails['technical-director'])
  operator = await signedIn(app.url, alpha.emails['fly-operator'])
})
afterAll(() => app.stop())

let nextNumber = 600
async function openTicket(weight: number) {
  const { id, hang } = await hungLineset(director, operator, nextNumber++, weight)
  const ticket = (await operator.post('/api/v1/tickets', { hangId: hang.id }).expect(201)).body
  return { linesetId: id, ticket }
}

interface StockRow {
  owned: number
  on_arbors: number
  reserved: number
  in_storage: number
  counted: number
}
const stock = async () =>
  (
    await app.handle.db.sequelize.query<StockRow>(
      `SELECT quantity_owned AS owned, on_arbors, reserved, in_storage,
              (SELECT coalesce(sum(count), 0)::int FROM arbor_bricks WHERE brick_type_id = $1) AS counted
         FROM brick_types WHERE id = $1`,
      { bind: [alpha.brickTypeId], type: QueryTypes.SELECT },
    )
  )[0]!

describe('ticket moves under concurrency', () => {
  it('when 20 approvals of one ticket race, then exactly one succeeds, the rest answer 409 naming the state, and the bricks are reserved once', async () => {
    const { linesetId, ticket } = await openTicket(200)
    const before = await stock()
    const answers = await Promise.all(
      Array.from({ length: 20 }, (_, n) =>
        (n % 2 ? admin : director).post(`/api/v1/tickets/${ticket.id}/approve`, { version: 0 }),
      ),
    )
    expect(answers.filter((res) => res.status === 200)).toHaveLength(1)
    for (const res of answers.filter((r) => r.status !== 200)) {
      expect(res.status).toBe(409)
      expect(res.body.error).toMatchObject({ code: 'ticket_state', fields: { state: 'approved' } })
    }
    const after = await stock()
    expect(after.reserved - before.reserved).toBe(5)
    const approvals = await app.handle.db.models.LinesetEvent.count({
      where: { linesetId, eventType: 'ticket-approved' },
    })
    expect(approvals).toBe(1)
    const mails = await app.mailbox.allTo(alpha.emails['fly-operator'])
    expect(mails.filter((mail) => mail.text.includes(ticket.id) && /approved/.test(mail.subject))).toHaveLength(1)
    await operator.post(`/api/v1/tickets/${ticket.id}/withdraw`, { version: 1 }).expect(200)
  })

  it('when 50 completions race for scarce storage, then nothing goes negative, owned = on arbors + reserved + in storage, and exactly what storage allows succeeds', async () => {
    const tickets: { linesetId: string; id: string }[] = []
    for (let n = 0; n < 50; n++) {
      const { linesetId, ticket } = await openTicket(120)
      expect(ticket.changes).toEqual([expect.objectContaining({ count: 1 })])
      await director.post(`/api/v1/tickets/${ticket.id}/approve`, { version: 0 }).expect(200)
      await operator.post(`/api/v1/tickets/${ticket.id}/start-loading`, { version: 1 }).expect(200)
      tickets.push({ linesetId, id: ticket.id })
    }
    const before = await stock()
    expect(before).toMatchObject({ reserved: 50, in_storage: 50 })
    // Each completion loads three where one was reserved: two more from storage, so 50 in storage serve 25.
    const answers = await Promise.all(
      tickets.map((ticket) =>
        operator.post(`/api/v1/tickets/${ticket.id}/complete`, {
          version: 2,
          loaded: [{ brickTypeId: alpha.brickTypeId, count: 3 }],
          feltBalance: 'arbor-heavy',
          differsFromPlan: true,
        }),
      ),
    )
    const done = answers.filter((res) => res.status === 200)
    for (const res of answers.filter((r) => r.status !== 200))
      expect(res.body.error).toMatchObject({ code: 'not_enough_bricks' })
    expect(done).toHaveLength(25)
    const after = await stock()
    for (const count of [after.on_arbors, after.reserved, after.in_storage]) expect(count).toBeGreaterThanOrEqual(0)
    expect(after.on_arbors + after.reserved + after.in_storage).toBe(after.owned)
    expect(after.counted).toBe(after.on_arbors)
    expect(after).toMatchObject({ on_arbors: 75, reserved: 25, in_storage: 0 })
  })
})
