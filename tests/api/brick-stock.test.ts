import { QueryTypes } from 'sequelize'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { sampleBrickType, sampleLineset, seedVenue, type VenueFixture } from '../support/fixtures.js'
import { signedIn, startTestApp, type Client, type TestApp } from '../support/test-app.js'

// The fixture's brick type "Full" weighs 20 lb and the house owns 100 (invented test data).
let app: TestApp
let alpha: VenueFixture
let director: Client
let stageManager: Client

beforeAll(async () => {
  app = await startTestApp()
  alpha = await seedVenue(app.handle.context, 'alpha')
  director = await signedIn(app.url, alpha.emails['technical-director'])
  stageManager = await signedIn(app.url, alpha.emails['stage-manager'])
})
afterAll(() => app.stop())

const sql = (text: string, bind: unknown[] = []) =>
  app.handle.db.sequelize.query(text, { bind, type: QueryTypes.SELECT })

async function newBrickType(name: string, owned: number) {
  return (await director.post('/api/v1/brick-types', sampleBrickType(name, { quantityOwned: owned })).expect(201)).body
}
async function lineWith(count: number, brickTypeId: string) {
  const id = (await director.post('/api/v1/linesets', sampleLineset(400 + count)).expect(201)).body.id
  await director.put(`/api/v1/linesets/${id}/arbor`, { version: 0, bricks: [{ brickTypeId, count }] }).expect(200)
  return id as string
}
const stockLine = async (client: Client, brickTypeId: string) =>
  ((await client.get('/api/v1/brick-stock').expect(200)).body as { brickTypeId: string }[]).find(
    (line) => line.brickTypeId === brickTypeId,
  )

describe('the brick stock', () => {
  it('when a brick type is added, then every brick it owns is in storage, and every role reads the stock', async () => {
    const type = await newBrickType('Stock new', 30)
    expect(await stockLine(stageManager, type.id)).toEqual({
      brickTypeId: type.id,
      name: 'Stock new',
      owned: 30,
      onArbors: 0,
      reserved: 0,
      inStorage: 30,
      retired: false,
      byLineset: [],
    })
  })

  it('when the house buys more bricks, then the difference goes into storage and what is on arbors stays', async () => {
    const type = await newBrickType('Stock bought', 20)
    await lineWith(8, type.id)
    const res = await director.put(`/api/v1/brick-types/${type.id}`, { ...type, quantityOwned: 50 })
    expect(res.status, res.text).toBe(200)
    expect(await stockLine(director, type.id)).toMatchObject({ owned: 50, onArbors: 8, inStorage: 42 })
  })

  it('when owned would drop below what is on arbors and reserved, then it answers 409 in words and changes nothing', async () => {
    const type = await newBrickType('Stock sold', 20)
    await lineWith(9, type.id)
    const res = await director.put(`/api/v1/brick-types/${type.id}`, { ...type, quantityOwned: 5 })
    expect(res.status).toBe(409)
    expect(res.body.error).toMatchObject({
      code: 'bricks_in_use',
      message: '"Stock sold": 9 are on arbors and 0 reserved, so the house must own at least 9',
      fields: { quantityOwned: 'At least 9: 9 on arbors, 0 reserved' },
    })
    expect(await stockLine(director, type.id)).toMatchObject({ owned: 20, onArbors: 9, inStorage: 11 })
    const down = await director.put(`/api/v1/brick-types/${type.id}`, { ...type, quantityOwned: 9 })
    expect(down.status).toBe(200)
    expect(await stockLine(director, type.id)).toMatchObject({ owned: 9, onArbors: 9, inStorage: 0 })
  })

  it('when a brick type with bricks on an arbor is deleted, then it is retired and still listed while they are aboard', async () => {
    const type = await newBrickType('Stock retired', 10)
    await lineWith(3, type.id)
    await director.delete(`/api/v1/brick-types/${type.id}`).expect(204)
    expect(await stockLine(director, type.id)).toMatchObject({ retired: true, onArbors: 3 })
  })
})

describe('the database holds the stock identity itself', () => {
  const refused = async (statements: string, bind: unknown[] = []) => {
    const error = await app.handle.db.sequelize
      .transaction(async (transaction) => {
        for (const statement of statements.split(';').filter((s) => s.trim()))
          await app.handle.db.sequelize.query(statement, { bind, transaction })
      })
      .then(
        () => null,
        (e: Error) => e,
      )
    expect(error, 'the database accepted it').not.toBeNull()
    return String((error as { parent?: Error }).parent?.message ?? error!.message)
  }

  it('when SQL sets a count below zero, then the database refuses it', async () => {
    const type = await newBrickType('Raw negative', 10)
    expect(
      await refused(
        'UPDATE brick_types SET in_storage = in_storage - 11, reserved = reserved + 11, quantity_owned = quantity_owned WHERE id = $1',
        [type.id],
      ),
    ).toMatch(/in_storage_not_negative/)
    expect(await refused('UPDATE brick_types SET on_arbors = -1, in_storage = 11 WHERE id = $1', [type.id])).toMatch(
      /not_negative/,
    )
  })

  it('when SQL breaks owned = on arbors + reserved + in storage, then the database refuses it', async () => {
    const type = await newBrickType('Raw identity', 10)
    expect(await refused('UPDATE brick_types SET in_storage = in_storage + 1 WHERE id = $1', [type.id])).toMatch(
      /stock_adds_up/,
    )
  })

  it('when SQL puts bricks on an arbor without taking them from the stock, then the commit is refused', async () => {
    const type = await newBrickType('Raw arbor', 10)
    expect(
      await refused(`INSERT INTO arbor_bricks (venue_id, lineset_id, brick_type_id, count) VALUES ($1, $2, $3, 2)`, [
        alpha.venueId,
        alpha.linesetId,
        type.id,
      ]),
    ).toMatch(/records 0 bricks on arbors but the arbors hold 2/)
  })

  it('when SQL sets an arbor count below zero, then the database refuses it', async () => {
    const type = await newBrickType('Raw arbor negative', 10)
    expect(
      await refused(`INSERT INTO arbor_bricks (venue_id, lineset_id, brick_type_id, count) VALUES ($1, $2, $3, -1)`, [
        alpha.venueId,
        alpha.linesetId,
        type.id,
      ]),
    ).toMatch(/arbor_bricks_count_not_negative/)
  })

  it('when SQL moves bricks from storage to an arbor in full, then the database accepts it', async () => {
    const type = await newBrickType('Raw whole move', 10)
    await app.handle.db.sequelize.transaction(async (transaction) => {
      await app.handle.db.sequelize.query(
        'UPDATE brick_types SET in_storage = in_storage - 2, on_arbors = on_arbors + 2 WHERE id = $1',
        { bind: [type.id], transaction },
      )
      await app.handle.db.sequelize.query(
        'INSERT INTO arbor_bricks (venue_id, lineset_id, brick_type_id, count) VALUES ($1, $2, $3, 2)',
        { bind: [alpha.venueId, alpha.linesetId, type.id], transaction },
      )
    })
    expect(await sql('SELECT on_arbors, in_storage FROM brick_types WHERE id = $1', [type.id])).toEqual([
      { on_arbors: 2, in_storage: 8 },
    ])
  })
})
