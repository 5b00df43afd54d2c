import { QueryTypes } from 'sequelize'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { AppContext, ServiceContext } from '../../server/context.js'
import { createBrickType } from '../../server/modules/brick-types/brick-type.service.js'
import {
  loadBricks,
  moveArborBricks,
  releaseReservation,
  reserveBricks,
} from '../../server/modules/brick-stock/brick-stock.service.js'
import { createLineset } from '../../server/modules/linesets/lineset.service.js'
import { linesetInputSchemaFor } from '../../shared/schemas/lineset.js'
import { sampleLineset, seedVenue, type VenueFixture } from '../support/fixtures.js'
import { startTestApp, type TestApp } from '../support/test-app.js'

// Many stock moves at once, each in its own transaction on its own connection, against scarce bricks.
let app: TestApp
let context: AppContext
let venue: VenueFixture
let asDirector: ServiceContext

beforeAll(async () => {
  app = await startTestApp()
  context = app.handle.context
  venue = await seedVenue(context, 'alpha')
  asDirector = { ...context, actor: venue.members['technical-director'] }
})
afterAll(() => app.stop())

const scarce = async (name: string, owned: number) =>
  (
    await createBrickType(asDirector, {
      name,
      material: 'Steel',
      unitWeight: 20,
      thickness: 2,
      quantityOwned: owned,
      unitSystem: 'imperial',
    })
  ).id

const linesets = async (count: number, from: number) => {
  const ids: string[] = []
  for (let n = from; n < from + count; n++)
    ids.push((await createLineset(asDirector, linesetInputSchemaFor('imperial').parse(sampleLineset(n)))).id)
  return ids
}

interface StockRow {
  quantity_owned: number
  on_arbors: number
  reserved: number
  in_storage: number
  counted: number
}
const stock = async (id: string) =>
  (
    await context.db.sequelize.query<StockRow>(
      `SELECT quantity_owned, on_arbors, reserved, in_storage,
              (SELECT coalesce(sum(count), 0)::int FROM arbor_bricks WHERE brick_type_id = $1) AS counted
         FROM brick_types WHERE id = $1`,
      { bind: [id], type: QueryTypes.SELECT },
    )
  )[0]!

function expectIdentity(row: StockRow) {
  for (const count of [row.on_arbors, row.reserved, row.in_storage]) expect(count).toBeGreaterThanOrEqual(0)
  expect(row.on_arbors + row.reserved + row.in_storage).toBe(row.quantity_owned)
  expect(row.counted).toBe(row.on_arbors)
}

const settle = async (work: Promise<unknown>[]) => {
  const outcomes = await Promise.allSettled(work)
  const refusals = outcomes.flatMap((o) =>
    o.status === 'rejected' ? [o.reason as { status?: number; code?: string }] : [],
  )
  for (const refusal of refusals) expect(refusal).toMatchObject({ status: 409, code: 'not_enough_bricks' })
  return outcomes.length - refusals.length
}

describe('stock moves under concurrency', () => {
  it('when 50 reservations of 1 to 3 bricks race for 40 in storage, then nothing goes negative, the identity holds and every brick is accounted for', async () => {
    const type = await scarce('Race reserve', 40)
    const sizes = Array.from({ length: 50 }, (_, i) => (i % 3) + 1)
    const outcomes = await Promise.allSettled(
      sizes.map((count) => reserveBricks(asDirector, [{ brickTypeId: type, count }])),
    )
    const reserved = outcomes.reduce((sum, o, i) => sum + (o.status === 'fulfilled' ? sizes[i]! : 0), 0)
    for (const o of outcomes) if (o.status === 'rejected') expect(o.reason).toMatchObject({ code: 'not_enough_bricks' })
    const row = await stock(type)
    expectIdentity(row)
    expect(row.reserved).toBe(reserved)
    expect(reserved).toBeGreaterThan(37) // once fewer than 3 are left, only small requests still fit
    expect(row.in_storage).toBe(40 - reserved)
  })

  it('when 50 loads onto 10 arbors race for 30 bricks in storage, then exactly 30 succeed and the arbors hold them all', async () => {
    const type = await scarce('Race arbor', 30)
    const arbors = await linesets(10, 600)
    const succeeded = await settle(
      Array.from({ length: 50 }, (_, i) =>
        moveArborBricks(asDirector, arbors[i % 10]!, [{ brickTypeId: type, count: 1 }]),
      ),
    )
    expect(succeeded).toBe(30)
    const row = await stock(type)
    expectIdentity(row)
    expect(row).toMatchObject({ on_arbors: 30, in_storage: 0 })
  })

  it('when 50 completions over two brick types race (each releasing a reservation and loading two types, named in opposite orders), then nothing deadlocks or goes negative', async () => {
    const first = await scarce('Race first', 60)
    const second = await scarce('Race second', 60)
    const arbors = await linesets(5, 700)
    await reserveBricks(asDirector, [
      { brickTypeId: first, count: 25 },
      { brickTypeId: second, count: 25 },
    ])
    const completions = Array.from({ length: 50 }, (_, i) => {
      const [a, b] = i % 2 ? [first, second] : [second, first]
      return loadBricks(asDirector, arbors[i % 5]!, {
        reserved: [{ brickTypeId: a, count: 1 }],
        loaded: [
          { brickTypeId: b, count: 2 },
          { brickTypeId: a, count: 1 },
        ],
        feltBalance: 'balanced',
      })
    })
    const succeeded = await settle(completions)
    for (const id of [first, second]) expectIdentity(await stock(id))
    const rows = [await stock(first), await stock(second)]
    expect(rows[0]!.reserved + rows[1]!.reserved).toBe(50 - succeeded)
    expect(rows[0]!.on_arbors + rows[1]!.on_arbors).toBe(3 * succeeded)
  })

  it('when a reservation is released, then the bricks are back in storage; releasing more than is reserved is refused', async () => {
    const type = await scarce('Release', 10)
    await reserveBricks(asDirector, [{ brickTypeId: type, count: 4 }])
    await releaseReservation(asDirector, [{ brickTypeId: type, count: 3 }])
    expect(await stock(type)).toMatchObject({ reserved: 1, in_storage: 9 })
    await expect(releaseReservation(asDirector, [{ brickTypeId: type, count: 2 }])).rejects.toMatchObject({
      status: 409,
      message: 'Not enough "Release" reserved: 2 bricks needed, 1 there, 1 missing',
    })
  })
})
