import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { MAX_ITEMS } from '../../shared/schemas/calculation.js'
import { databaseFingerprint } from '../support/database-fingerprint.js'
import { sampleLineset, seedVenue, type VenueFixture } from '../support/fixtures.js'
import { signedIn, startTestApp, type Client, type TestApp } from '../support/test-app.js'

// The sample lineset: a 40 ft batten on lift lines at 0, 10, 20, 30 and 40 ft (invented test data).
let app: TestApp
let alpha: VenueFixture
let beta: VenueFixture
let operator: Client
let director: Client
let stageManager: Client
let otherVenue: Client
let washId: string

beforeAll(async () => {
  app = await startTestApp()
  alpha = await seedVenue(app.handle.context, 'alpha')
  beta = await seedVenue(app.handle.context, 'beta')
  operator = await signedIn(app.url, alpha.emails['fly-operator'])
  director = await signedIn(app.url, alpha.emails['technical-director'])
  stageManager = await signedIn(app.url, alpha.emails['stage-manager'])
  otherVenue = await signedIn(app.url, beta.emails.administrator)
  const wash = { name: 'LED wash', category: 'lighting', unitWeight: 12, allowancePerUnit: 2, unitSystem: 'imperial' }
  washId = (await operator.post('/api/v1/item-types', wash).expect(201)).body.id
})
afterAll(() => app.stop())

let nextNumber = 200
/** A fresh lineset like the sample, so each test counts its own revisions. */
async function freshLineset(): Promise<string> {
  return (await director.post('/api/v1/linesets', sampleLineset(nextNumber++)).expect(201)).body.id
}

const hangsOf = (linesetId: string) => `/api/v1/linesets/${linesetId}/hangs`
const save = (linesetId: string, items: object[], basedOnRevision: number | null = null, extra: object = {}) =>
  operator.post(hangsOf(linesetId), { title: 'Act one', basedOnRevision, items, unitSystem: 'imperial', ...extra })

const electric = () => [
  { label: 'Wash', category: 'lighting', itemTypeId: washId, quantity: 5, from: 4, to: 36 },
  { label: 'Cable', category: 'hardware', weightPerLength: 0.5, from: 0, to: 40 },
  { label: 'Sandbag', category: 'hardware', weight: 25, at: 20 },
]

describe('saving a hang', () => {
  it('when a fly operator saves, then revision 1 is stored with its items, input and the engine result, and reads back alike', async () => {
    const linesetId = await freshLineset()
    const res = await save(linesetId, electric())
    expect(res.status, res.text).toBe(201)
    expect(res.body).toMatchObject({ revision: 1, title: 'Act one', productionId: null, linesetId })
    expect(res.body.items[2]).toEqual({ label: 'Sandbag', category: 'hardware', weight: 25, at: 20, quantity: 1 })
    const read = (await stageManager.get(`${hangsOf(linesetId)}/${res.body.id}`).expect(200)).body
    expect(read.items).toEqual(res.body.items)
    expect(read.result).toEqual(res.body.result)
    expect(read.createdBy).toEqual({ id: alpha.members['fly-operator'].id, name: alpha.members['fly-operator'].name })
  })

  it('when the stored input is sent to POST /calculations, then the answer equals the stored result', async () => {
    const linesetId = await freshLineset()
    const saved = (await save(linesetId, electric()).expect(201)).body
    const row = await app.handle.db.models.Hang.findByPk(saved.id)
    const engine = (await stageManager.post('/api/v1/calculations', row!.calculationInput!).expect(200)).body
    expect(engine).toEqual(saved.result)
    expect(row!.calculationResult).toEqual(saved.result)
  })

  it('when a revision is read, then it carries the engine input it was computed from, one load per item, on the batten as it was', async () => {
    const linesetId = await freshLineset()
    const saved = (await save(linesetId, electric()).expect(201)).body
    const read = (await stageManager.get(`${hangsOf(linesetId)}/${saved.id}`).expect(200)).body
    const row = await app.handle.db.models.Hang.findByPk(saved.id)
    expect(read.input).toEqual(row!.calculationInput)
    expect(saved.input).toEqual(read.input)
    expect(read.input.units).toBe(read.result.units)
    expect(read.input.batten).toMatchObject({ length: 40, pickPoints: [0, 10, 20, 30, 40] })
    // Five wash units spread from 4 to 36 ft, the cable along the whole batten, the sandbag at 20 ft.
    expect(read.input.items.filter((item: { at?: number }) => item.at !== undefined)).toHaveLength(6)
    expect(read.input.items.filter((item: { from?: number }) => item.from !== undefined)).toEqual([
      { label: 'Cable', weightPerLength: 0.5, from: 0, to: 40 },
    ])
    // The lineset changes afterwards; the revision still reads with the batten it was computed on.
    const lineset = (await director.get(`/api/v1/linesets/${linesetId}`).expect(200)).body
    await director
      .put(`/api/v1/linesets/${linesetId}`, {
        ...sampleLineset(lineset.number),
        version: lineset.version,
        battenLength: 42,
      })
      .expect(200)
    const after = (await stageManager.get(`${hangsOf(linesetId)}/${saved.id}`).expect(200)).body
    expect(after.input.batten.length).toBe(40)
  })

  it('when the stored input is missing or no longer reads as an engine input, then the revision answers input null and its result as saved', async () => {
    const linesetId = await freshLineset()
    const saved = (await save(linesetId, electric()).expect(201)).body
    const read = () => stageManager.get(`${hangsOf(linesetId)}/${saved.id}`).expect(200)
    await app.handle.db.models.Hang.update(
      { calculationInput: { units: 'imperial', batten: 'old shape' } },
      { where: { id: saved.id } },
    )
    expect((await read()).body).toMatchObject({ input: null, result: saved.result })
    await app.handle.db.models.Hang.update({ calculationInput: null }, { where: { id: saved.id } })
    expect((await read()).body).toMatchObject({ input: null, result: saved.result })
  })

  it('when library units are spread along a stretch, then the engine gets one load per unit, evenly from the first to the last', async () => {
    const linesetId = await freshLineset()
    const saved = (await save(linesetId, electric().slice(0, 1)).expect(201)).body
    const row = await app.handle.db.models.Hang.findByPk(saved.id)
    const items = (row!.calculationInput as { items: unknown[] }).items
    expect(items).toEqual([4, 12, 20, 28, 36].map((at) => ({ label: 'Wash', weight: 14, at })))
    expect(saved.result.itemsWeight).toBe(70)
  })

  it('when soft goods are entered by fabric grade, then their weight matches the worked check: 40 ft x 20 ft of 25 oz goods at 100 % fullness is about 185.2 lb', async () => {
    // Basis: fabric sold by the running yard of 54 in goods, so 1 oz per running yard = 36/54 oz/yd²; 25 oz
    // goods = 25/216 lb/ft² = 0.1157 lb/ft², x 20 ft x 2 (fullness) x 40 ft = 185.19 lb, fabric only.
    const linesetId = await freshLineset()
    const border = {
      label: 'Border',
      category: 'soft-goods',
      from: 0,
      to: 40,
      fabric: { gradeOzPerLinearYard: 25, height: 20, fullnessPercent: 100 },
    }
    const saved = (await save(linesetId, [border]).expect(201)).body
    expect(saved.result.itemsWeight).toBeCloseTo(185.19, 2)
    expect(saved.items[0]).toEqual(border)
  })

  it('when scenery hangs from its own pick points, then its scale weight is shared equally between them', async () => {
    const linesetId = await freshLineset()
    const flat = { label: 'Wall', category: 'scenery', weight: 300, points: [5, 20, 35] }
    const saved = (await save(linesetId, [flat]).expect(201)).body
    const row = await app.handle.db.models.Hang.findByPk(saved.id)
    expect((row!.calculationInput as { items: unknown[] }).items).toEqual(
      [5, 20, 35].map((at) => ({ label: 'Wall', weight: 100, at })),
    )
  })

  it('when a client sends a result of its own, then it is ignored and the server computes its own', async () => {
    const linesetId = await freshLineset()
    const res = await save(linesetId, electric(), null, { result: { totalLoad: 1 }, totalLoad: 1 })
    expect(res.status).toBe(201)
    expect(res.body.result.totalLoad).toBeGreaterThan(100)
  })
})

describe('revisions', () => {
  it('when saves follow one another, then revisions count from 1 per lineset, newest first in the list', async () => {
    const first = await freshLineset()
    const second = await freshLineset()
    await save(first, electric()).expect(201)
    await save(first, electric(), 1, { title: 'Act two' }).expect(201)
    expect((await save(second, electric()).expect(201)).body.revision).toBe(1)
    const list = (await stageManager.get(hangsOf(first)).expect(200)).body
    expect(list.map((hang: { revision: number; title: string }) => [hang.revision, hang.title])).toEqual([
      [2, 'Act two'],
      [1, 'Act one'],
    ])
    expect(list[0]).toMatchObject({ productionId: null, createdBy: { id: alpha.members['fly-operator'].id } })
    expect(list[0].totalLoad).toBeGreaterThan(0)
  })

  it('when a save only repeats the latest revision, then it answers 409 hang_unchanged and writes nothing; any change saves', async () => {
    const linesetId = await freshLineset()
    await save(linesetId, electric()).expect(201)
    const before = await databaseFingerprint(app.handle.db.sequelize)
    const again = await save(linesetId, electric(), 1)
    expect(again.status).toBe(409)
    expect(again.body.error.code).toBe('hang_unchanged')
    expect(again.body.error.message).toMatch(/^Nothing has changed since revision 1/)
    expect(await databaseFingerprint(app.handle.db.sequelize)).toBe(before)
    // A different category changes no figure, but it is a change all the same.
    const recategorised = electric().map((item, k) => (k === 2 ? { ...item, category: 'scenery' } : item))
    expect((await save(linesetId, recategorised, 1).expect(201)).body.revision).toBe(2)
    expect((await save(linesetId, recategorised, 2, { title: 'Act one, notes' }).expect(201)).body.revision).toBe(3)
  })

  it('when a save is based on an older revision, then it answers 409 with the latest number and writes nothing', async () => {
    const linesetId = await freshLineset()
    await save(linesetId, electric()).expect(201)
    await save(linesetId, electric(), 1, { title: 'Act one, second look' }).expect(201)
    const before = await databaseFingerprint(app.handle.db.sequelize)
    for (const stale of [null, 1, 7]) {
      const res = await save(linesetId, electric(), stale)
      expect(res.status).toBe(409)
      expect(res.body.error.code).toBe('stale_revision')
      expect(res.body.error.message).toContain('Revision 2')
    }
    expect(await databaseFingerprint(app.handle.db.sequelize)).toBe(before)
  })

  it('when eight saves on the same base race, then exactly one becomes the next revision and the rest answer 409', async () => {
    const linesetId = await freshLineset()
    const answers = await Promise.all(Array.from({ length: 8 }, () => save(linesetId, electric())))
    expect(answers.map((res) => res.status).sort()).toEqual([201, 409, 409, 409, 409, 409, 409, 409])
    expect(await app.handle.db.models.Hang.count({ where: { linesetId } })).toBe(1)
    expect(await app.handle.db.models.LinesetEvent.count({ where: { linesetId, eventType: 'hang-saved' } })).toBe(1)
  })

  it('when a revision is saved, then the lineset list shows it as the current hang', async () => {
    const linesetId = await freshLineset()
    const saved = (await save(linesetId, electric()).expect(201)).body
    const list = (await stageManager.get('/api/v1/linesets').expect(200)).body as {
      id: string
      currentHang: unknown
    }[]
    expect(list.find((lineset) => lineset.id === linesetId)!.currentHang).toEqual({
      id: saved.id,
      revision: 1,
      title: 'Act one',
      totalLoad: saved.result.totalLoad,
    })
    expect(list.find((lineset) => lineset.id === alpha.linesetId)!.currentHang).toBeNull()
  })
})

describe('the ledger', () => {
  it('when a revision is saved, then the history says so in words, with its figures in the venue units', async () => {
    const linesetId = await freshLineset()
    const saved = (await save(linesetId, electric()).expect(201)).body
    const history = (await stageManager.get(`/api/v1/linesets/${linesetId}/events`).expect(200)).body
    const entry = history.events[0]
    expect(entry).toMatchObject({ type: 'hang-saved', actor: { id: alpha.members['fly-operator'].id } })
    expect(entry.summary).toMatch(/^Saved hang revision 1, “Act one”: 3 items, [\d,.]+ lb in all$/)
    expect(entry.payload.hang).toMatchObject({ id: saved.id, revision: 1, totalLoad: saved.result.totalLoad })
    const stored = await app.handle.db.models.LinesetEvent.findOne({ where: { linesetId, eventType: 'hang-saved' } })
    // SI in the ledger: kg (NIST SP 811: 1 lb = 0.45359237 kg).
    expect(Number((stored!.payload.hang as { totalLoad: string }).totalLoad)).toBeCloseTo(
      saved.result.totalLoad * 0.45359237,
      6,
    )
  })
})

describe('bad input', () => {
  const refusals: Array<[string, object, string]> = [
    ['a negative weight', { label: 'X', category: 'other', weight: -1, at: 5 }, 'items.0.weight'],
    ['a weight that is not a number', { label: 'X', category: 'other', weight: 'heavy', at: 5 }, 'items.0.weight'],
    [
      'a stretch beyond the batten',
      { label: 'X', category: 'other', weightPerLength: 1, from: 0, to: 41 },
      'items.0.to',
    ],
    ['a reversed stretch', { label: 'X', category: 'other', weightPerLength: 1, from: 30, to: 10 }, 'items.0.to'],
    [
      'fullness below zero',
      {
        label: 'X',
        category: 'soft-goods',
        from: 0,
        to: 40,
        fabric: { gradeOzPerLinearYard: 25, height: 20, fullnessPercent: -5 },
      },
      'items.0.fabric.fullnessPercent',
    ],
    ['an unknown category', { label: 'X', category: 'fireworks', weight: 1, at: 5 }, 'items.0.category'],
    [
      'an unknown item type',
      { label: 'X', category: 'lighting', itemTypeId: '00000000-0000-4000-8000-000000000000', quantity: 1, at: 5 },
      'items.0.itemTypeId',
    ],
  ]
  for (const [what, entry, field] of refusals) {
    it(`when an item has ${what}, then it answers 400 naming ${field} and writes nothing`, async () => {
      const before = await databaseFingerprint(app.handle.db.sequelize)
      const res = await save(alpha.linesetId, [electric()[2]!, entry].reverse())
      expect(res.status, res.text).toBe(400)
      expect(res.body.error.code).toBe('validation_failed')
      expect(Object.keys(res.body.error.fields)).toContain(field)
      expect(await databaseFingerprint(app.handle.db.sequelize)).toBe(before)
    })
  }

  it("when an item names another venue's item type, then it answers 400 naming it and writes nothing", async () => {
    const theirs = {
      name: 'Their wash',
      category: 'lighting',
      unitWeight: 12,
      allowancePerUnit: 2,
      unitSystem: 'imperial',
    }
    const theirId = (await otherVenue.post('/api/v1/item-types', theirs).expect(201)).body.id
    const before = await databaseFingerprint(app.handle.db.sequelize)
    const res = await save(alpha.linesetId, [
      { label: 'X', category: 'lighting', itemTypeId: theirId, quantity: 1, at: 5 },
    ])
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual({ 'items.0.itemTypeId': 'No such item type in this venue’s library' })
    expect(await databaseFingerprint(app.handle.db.sequelize)).toBe(before)
  })

  it('when more than 1,000 items are sent, or entries would make more loads than one batten takes, then it answers 400 and writes nothing', async () => {
    const before = await databaseFingerprint(app.handle.db.sequelize)
    const many = Array.from({ length: 1001 }, () => ({ label: 'X', category: 'other', weight: 1, at: 5 }))
    expect((await save(alpha.linesetId, many)).body.error.fields).toHaveProperty('items')
    const spread = [
      { label: 'X', category: 'lighting', itemTypeId: washId, quantity: MAX_ITEMS, from: 0, to: 40 },
      { label: 'Y', category: 'other', weight: 1, at: 5 },
    ]
    const res = await save(alpha.linesetId, spread)
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toHaveProperty('items')
    expect(await databaseFingerprint(app.handle.db.sequelize)).toBe(before)
  })

  it('when the figures were typed in units the venue no longer uses, then it answers 409 units_changed', async () => {
    const res = await save(alpha.linesetId, electric(), null, { unitSystem: 'metric' })
    expect(res.status).toBe(409)
    expect(res.body.error.code).toBe('units_changed')
  })
})

describe('who may do what', () => {
  it('when a stage manager saves a hang, then it answers 403; reading the list and a revision is allowed', async () => {
    const linesetId = await freshLineset()
    const saved = (await save(linesetId, electric()).expect(201)).body
    const res = await stageManager.post(hangsOf(linesetId), {
      title: 'Mine',
      basedOnRevision: 1,
      items: [],
      unitSystem: 'imperial',
    })
    expect(res.status).toBe(403)
    await stageManager.get(hangsOf(linesetId)).expect(200)
    await stageManager.get(`${hangsOf(linesetId)}/${saved.id}`).expect(200)
  })

  it("when another venue reads or saves this venue's hangs, then every route answers 404", async () => {
    const linesetId = await freshLineset()
    const saved = (await save(linesetId, electric()).expect(201)).body
    expect((await otherVenue.get(hangsOf(linesetId))).status).toBe(404)
    expect((await otherVenue.get(`${hangsOf(linesetId)}/${saved.id}`)).status).toBe(404)
    const theirs = await otherVenue.post(hangsOf(linesetId), {
      title: 'X',
      basedOnRevision: 1,
      items: [],
      unitSystem: 'imperial',
    })
    expect(theirs.status).toBe(404)
  })

  it('when a hang names a production of another venue or a closed one, then it answers 400 naming productionId', async () => {
    const closed = {
      name: 'Closed show',
      firstPerformance: '2025-01-01',
      lastPerformance: '2025-02-01',
      state: 'closed',
    }
    const closedId = (await director.post('/api/v1/productions', closed).expect(201)).body.id
    const foreign = { ...closed, name: 'Their show', state: 'running' }
    const foreignId = (await otherVenue.post('/api/v1/productions', foreign).expect(201)).body.id
    for (const productionId of [closedId, foreignId]) {
      const res = await save(alpha.linesetId, electric(), null, { productionId })
      expect(res.status).toBe(400)
      expect(Object.keys(res.body.error.fields)).toEqual(['productionId'])
    }
    const running = { ...closed, name: 'Running show', state: 'running' }
    const runningId = (await director.post('/api/v1/productions', running).expect(201)).body.id
    const linesetId = await freshLineset()
    expect((await save(linesetId, electric(), null, { productionId: runningId }).expect(201)).body.productionId).toBe(
      runningId,
    )
  })
})
