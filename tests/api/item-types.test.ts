import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Client, TestApp } from '../support/test-app.js'
import { startTwoVenues } from '../support/venue-suite.js'

let app: TestApp
let operator: Client
let stageManager: Client
let otherVenue: Client

beforeAll(async () => {
  const venues = await startTwoVenues('metric')
  app = venues.app
  operator = venues.atAlpha['fly-operator']
  stageManager = venues.atAlpha['stage-manager']
  otherVenue = venues.atBeta.administrator
})
afterAll(() => app.stop())

const wash = (overrides: object = {}) => ({
  name: 'LED wash',
  category: 'lighting',
  unitWeight: 11,
  allowancePerUnit: 1.5,
  notes: 'Test data',
  unitSystem: 'imperial',
  ...overrides,
})

describe('the item library', () => {
  it('when a fly operator adds an item type in pounds, then it is stored in kilograms and reads back in pounds (NIST SP 811: 1 lb = 0.45359237 kg)', async () => {
    const created = (await operator.post('/api/v1/item-types', wash()).expect(201)).body
    expect(created).toMatchObject({ name: 'LED wash', unitWeight: 11, allowancePerUnit: 1.5, unitSystem: 'imperial' })
    const row = await app.handle.db.models.ItemType.findByPk(created.id, { raw: true })
    expect(row!.unitWeight).toBe('4.98951607')
    expect(row!.allowancePerUnit).toBe('0.680388555')
    const list = (await stageManager.get('/api/v1/item-types').expect(200)).body
    expect(list.map((item: { id: string }) => item.id)).toContain(created.id)
  })

  it('when a stage manager tries to add, change or retire an item type, then each answers 403 and nothing changes', async () => {
    const created = (await operator.post('/api/v1/item-types', wash({ name: 'PAR can' })).expect(201)).body
    expect((await stageManager.post('/api/v1/item-types', wash({ name: 'Nope' }))).status).toBe(403)
    expect((await stageManager.put(`/api/v1/item-types/${created.id}`, { ...created, name: 'Nope' })).status).toBe(403)
    expect((await stageManager.delete(`/api/v1/item-types/${created.id}`)).status).toBe(403)
    expect(await app.handle.db.models.ItemType.count({ where: { name: 'Nope' } })).toBe(0)
  })

  it('when an item type is changed at a stale version, then it answers 409 and keeps the first change', async () => {
    const created = (await operator.post('/api/v1/item-types', wash({ name: 'Fresnel' })).expect(201)).body
    const { id, ...body } = created
    await operator.put(`/api/v1/item-types/${id}`, { ...body, unitWeight: 10 }).expect(200)
    const stale = await operator.put(`/api/v1/item-types/${id}`, { ...body, unitWeight: 12 })
    expect(stale.status).toBe(409)
    expect(stale.body.error.code).toBe('stale_version')
    const list = (await operator.get('/api/v1/item-types')).body as { id: string; unitWeight: number }[]
    expect(list.find((item) => item.id === id)!.unitWeight).toBe(10)
  })

  it('when the figures were typed in units the venue no longer uses, then it answers 409 units_changed and stores nothing', async () => {
    const res = await operator.post('/api/v1/item-types', wash({ name: 'Metric wash', unitSystem: 'metric' }))
    expect(res.status).toBe(409)
    expect(res.body.error.code).toBe('units_changed')
    expect(await app.handle.db.models.ItemType.count({ where: { name: 'Metric wash' } })).toBe(0)
  })

  it('when an item type is retired, then it leaves the list, stays in storage, and a second retirement answers 404', async () => {
    const created = (await operator.post('/api/v1/item-types', wash({ name: 'Cyc light' })).expect(201)).body
    await operator.delete(`/api/v1/item-types/${created.id}`).expect(204)
    expect((await operator.delete(`/api/v1/item-types/${created.id}`)).status).toBe(404)
    const list = (await operator.get('/api/v1/item-types')).body as { id: string }[]
    expect(list.map((item) => item.id)).not.toContain(created.id)
    expect((await app.handle.db.models.ItemType.findByPk(created.id))!.retiredAt).not.toBeNull()
    // Its name is free again.
    await operator.post('/api/v1/item-types', wash({ name: 'Cyc light' })).expect(201)
  })

  it('when a name is already in the library, then it answers 409 duplicate naming the field', async () => {
    await operator.post('/api/v1/item-types', wash({ name: 'Moving spot' })).expect(201)
    const res = await operator.post('/api/v1/item-types', wash({ name: 'Moving spot' }))
    expect(res.status).toBe(409)
    expect(res.body.error.fields).toEqual({ name: 'Already in use' })
  })

  it('when fields are bad, then it answers 400 naming each one', async () => {
    const res = await operator.post('/api/v1/item-types', {
      ...wash(),
      name: '',
      category: 'fireworks',
      unitWeight: -1,
      allowancePerUnit: 'heavy',
    })
    expect(res.status).toBe(400)
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['allowancePerUnit', 'category', 'name', 'unitWeight'])
  })

  it('when another venue reads, changes or retires this venue item type, then it never sees it and gets 404', async () => {
    const created = (await operator.post('/api/v1/item-types', wash({ name: 'Private wash' })).expect(201)).body
    const theirs = (await otherVenue.get('/api/v1/item-types').expect(200)).body as { id: string }[]
    expect(theirs.map((item) => item.id)).not.toContain(created.id)
    const { id, ...body } = created
    expect((await otherVenue.put(`/api/v1/item-types/${id}`, { ...body, unitSystem: 'metric' })).status).toBe(404)
    expect((await otherVenue.delete(`/api/v1/item-types/${id}`)).status).toBe(404)
  })
})
