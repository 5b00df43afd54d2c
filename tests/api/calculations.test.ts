import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { runCalculation } from '../../shared/engine/calculate.js'
import { BAD_CALCULATION_INPUTS } from '../support/bad-calculation-inputs.js'
import { seedVenue } from '../support/fixtures.js'
import { signedIn, startTestApp, type Client, type TestApp } from '../support/test-app.js'

let app: TestApp
let flyOperator: Client

beforeAll(async () => {
  app = await startTestApp()
  const venue = await seedVenue(app.handle.context, 'alpha')
  flyOperator = await signedIn(app.url, venue.emails['fly-operator'])
})
afterAll(() => app.stop())

// Two equal spans, uniform load: end lines 0.375 wL, middle 1.25 wL (AISC Steel Construction Manual,
// beam diagrams and formulas, continuous beam of two equal spans, uniformly distributed load).
const twoSpans = {
  units: 'imperial',
  kind: 'counterweight-single',
  batten: { length: 40, weightPerLength: 0, pickPoints: [0, 20, 40] },
  items: [{ label: 'drape', weightPerLength: 10, from: 0, to: 40 }],
  arbor: { emptyWeight: 90, capacity: 2000, stackLength: 60 },
  bricks: [{ name: 'full', weight: 20, thickness: 2, available: 80 }],
  liftLine: { weightPerLength: 0.11, breakingStrength: 7000, designFactor: 8 },
  tolerance: 10,
}

describe('POST /api/v1/calculations', () => {
  it('when the input is valid, then it answers what the shared engine computes, line loads included', async () => {
    const res = await flyOperator.post('/api/v1/calculations', twoSpans)
    expect(res.status).toBe(200)
    expect(res.body.lineLoads).toEqual([
      { at: 0, load: 75 },
      { at: 20, load: 250 },
      { at: 40, load: 75 },
    ])
    expect(res.body.counterweight.ratio).toBe(1)
    const local = runCalculation(twoSpans)
    expect(local.ok && res.body).toEqual(local.ok ? JSON.parse(JSON.stringify(local.result)) : null)
  })

  it('when the input is invalid, then it answers 400 with the error shape naming the fields', async () => {
    const res = await flyOperator.post('/api/v1/calculations', {
      ...twoSpans,
      units: 'furlongs',
      batten: { ...twoSpans.batten, pickPoints: [0, 50] },
    })
    expect(res.status).toBe(400)
    expect(res.body.error.code).toBe('validation_failed')
    expect(Object.keys(res.body.error.fields)).toEqual(expect.arrayContaining(['units']))
  })

  it.each(BAD_CALCULATION_INPUTS)('when the input has %s, then it answers 400 naming %s', async (_, raw, field) => {
    const res = await flyOperator.post('/api/v1/calculations', raw as object)
    expect(res.status).toBe(400)
    expect(res.body.error.code).toBe('validation_failed')
    expect(Object.keys(res.body.error.fields)).toContain(field)
  })

  // The body reaches the calculation thread as JSON text: it is read there as the API's JSON reader reads it.
  const sendText = (contentType: string, text: string) =>
    flyOperator.agent
      .post('/api/v1/calculations')
      .set('X-CSRF-Token', flyOperator.csrfToken)
      .set('content-type', contentType)
      .send(text)

  it.each([
    ['cut short', '{"units": "imperial",'],
    ['a bare string at the top', '"imperial"'],
    ['a bare number at the top', '  42'],
  ])('when the body is %s, then it answers 400 malformed_json', async (_, text) => {
    const res = await sendText('application/json', text)
    expect(res.status).toBe(400)
    expect(res.body.error.code).toBe('malformed_json')
  })

  it('when the JSON comes with a charset and spaces around it, then it is answered as the same JSON would be', async () => {
    const res = await sendText('application/json; charset=utf-8', `\n  ${JSON.stringify(twoSpans)}  \n`)
    expect(res.status).toBe(200)
    expect(res.headers['content-type']).toMatch(/^application\/json/)
    expect(res.body.counterweight.ratio).toBe(1)
  })

  it('when the body is empty or not JSON at all, then it answers 400 naming the missing fields', async () => {
    for (const [type, text] of [
      ['application/json', ''],
      ['text/plain', JSON.stringify(twoSpans)],
    ]) {
      const res = await sendText(type!, text!)
      expect(res.status, type).toBe(400)
      expect(res.body.error.code, type).toBe('validation_failed')
    }
  })
})
