import fc from 'fast-check'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { SAMPLE_INPUT } from '../unit/engine/lineset-input.js'
import { sampleLineset, seedVenue, type VenueFixture } from '../support/fixtures.js'
import { signedIn, startTestApp, type Client, type TestApp } from '../support/test-app.js'

// Generated bad bodies for every route whose body the shared figure and text rules govern: whatever a body holds,
// the answer is never a 500 or a stack trace, and a refused body writes nothing.

let app: TestApp
let venue: VenueFixture
let admin: Client

beforeAll(async () => {
  app = await startTestApp()
  venue = await seedVenue(app.handle.context, 'alpha')
  admin = await signedIn(app.url, venue.emails.administrator)
})
afterAll(() => app.stop())

/** Values that have broken servers: absurd figures, text that cannot be stored, wrong shapes. */
const hostile = fc.oneof(
  fc.constantFrom(1e308, -1e308, 1e21, 1e-308, 1e-7, 2147483647, 2 ** 53, -0, 0.1 + 0.2, 2.5e9, 100000000000),
  fc.constantFrom('\u0000', 'a\uD800', '\uDFFFz', '\u202E', 'x'.repeat(5000), '', ' ', '1e400', 'NaN', '\u2028'),
  fc.constantFrom(null, true, [], {}, [1e308], { length: 1 }),
  fc.double(),
  fc.string({ unit: 'binary', maxLength: 40 }),
  fc.string({ unit: fc.integer({ min: 0, max: 0x1f }).map((code) => String.fromCharCode(code)), maxLength: 5 }),
)

/** A valid body with one field, or one field of a nested part, replaced by a hostile value. */
function mutated(base: Record<string, unknown>) {
  const keys = Object.keys(base)
  return fc.tuple(fc.constantFrom(...keys), hostile, fc.nat()).map(([key, value, pick]) => {
    const inner = base[key]
    if (Array.isArray(inner) && inner.length) {
      const list = [...inner]
      const at = pick % list.length
      const element = list[at]
      list[at] =
        element && typeof element === 'object'
          ? { ...element, [Object.keys(element)[pick % Object.keys(element).length]!]: value }
          : value
      return { ...base, [key]: list }
    }
    if (inner && typeof inner === 'object') {
      const innerKeys = Object.keys(inner)
      return { ...base, [key]: { ...inner, [innerKeys[pick % innerKeys.length]!]: value } }
    }
    return { ...base, [key]: value }
  })
}

const counts = async () => {
  const { models } = app.handle.db
  return Promise.all([
    models.Lineset.count(),
    models.LinesetEvent.count(),
    models.BrickType.count(),
    models.Membership.count(),
    models.User.count(),
    models.Venue.sum('version'),
    models.ItemType.count(),
    models.Production.count(),
    models.Hang.count(),
    models.HangItem.count(),
  ])
}

describe('generated bad bodies', () => {
  it('when any route is sent a body with one hostile value, then it never answers 500 and a refusal writes nothing', async () => {
    const lineset = (await admin.get(`/api/v1/linesets/${venue.linesetId}`)).body
    const brick = (await admin.get('/api/v1/brick-types')).body[0]
    const settings = (await admin.get('/api/v1/venue')).body
    const { id: _l, updatedAt: _u, ...linesetBody } = lineset
    const { id: brickId, ...brickBody } = brick
    const { id: _v, ...venueBody } = settings
    const routes: Array<[string, (body: object) => ReturnType<Client['post']>, Record<string, unknown>]> = [
      ['POST /calculations', (body) => admin.post('/api/v1/calculations', body), SAMPLE_INPUT],
      ['POST /linesets', (body) => admin.post('/api/v1/linesets', body), sampleLineset(50)],
      ['PUT /linesets/:id', (body) => admin.put(`/api/v1/linesets/${venue.linesetId}`, body), linesetBody],
      ['POST /brick-types', (body) => admin.post('/api/v1/brick-types', body), { ...brickBody, name: 'Fuzz' }],
      ['PUT /brick-types/:id', (body) => admin.put(`/api/v1/brick-types/${brickId}`, body), brickBody],
      ['PUT /venue', (body) => admin.put('/api/v1/venue', body), venueBody],
      [
        'POST /item-types',
        (body) => admin.post('/api/v1/item-types', body),
        {
          name: 'Fuzz',
          category: 'lighting',
          unitWeight: 11,
          allowancePerUnit: 1.5,
          notes: '',
          unitSystem: 'imperial',
        },
      ],
      [
        'POST /productions',
        (body) => admin.post('/api/v1/productions', body),
        { name: 'Fuzz', firstPerformance: '2026-11-20', lastPerformance: '2027-01-10', state: 'planning' },
      ],
      [
        'POST /linesets/:id/hangs',
        (body) => admin.post(`/api/v1/linesets/${venue.linesetId}/hangs`, body),
        {
          title: 'Fuzz',
          basedOnRevision: null,
          unitSystem: 'imperial',
          items: [
            { label: 'Drop', category: 'other', weight: 120, at: 20 },
            { label: 'Cable', category: 'hardware', weightPerLength: 0.5, from: 0, to: 40 },
            {
              label: 'Border',
              category: 'soft-goods',
              from: 0,
              to: 40,
              fabric: { gradeOzPerLinearYard: 25, height: 20, fullnessPercent: 100 },
            },
            { label: 'Wall', category: 'scenery', weight: 300, points: [5, 20, 35] },
          ],
        },
      ],
      [
        'POST /people',
        (body) => admin.post('/api/v1/people', body),
        { email: 'f@alpha.test', name: 'F', role: 'stage-manager' },
      ],
    ]
    await fc.assert(
      fc.asyncProperty(
        fc
          .constantFrom(...routes)
          .chain(([name, send, base]) => mutated(base).map((body) => [name, send, body] as const)),
        async ([name, send, body]) => {
          const before = await counts()
          const res = await send(body)
          expect(res.status, `${name} ${JSON.stringify(body).slice(0, 300)}`).toBeLessThan(500)
          expect(JSON.stringify(res.body)).not.toMatch(/\bat .+\.(ts|js):\d+/)
          if (res.status === 400) {
            expect(res.body.error.code).toMatch(/validation_failed|malformed_json/)
            expect(await counts()).toEqual(before)
          }
        },
      ),
      { numRuns: 300 },
    )
  })
})
