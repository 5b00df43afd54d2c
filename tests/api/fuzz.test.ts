import { readdirSync } from 'node:fs'
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { databaseFingerprint } from '../support/database-fingerprint.js'
import { sampleBrickType, sampleLineset, type VenueFixture } from '../support/fixtures.js'
import { multipartBody } from '../support/upload-files.js'
import { venueSuite } from '../support/venue-suite.js'

// A few hundred generated bad bodies across every write route, sent by an administrator (who may call
// them all): none may answer 500 or show a stack, and a refused request must write nothing.

type Json = null | boolean | number | string | Json[] | { [key: string]: Json }
interface Target {
  method: 'post' | 'put' | 'delete'
  path: (venue: VenueFixture) => string
  valid: (venue: VenueFixture) => Record<string, Json>
}

const calculation = {
  units: 'imperial',
  kind: 'counterweight-single',
  batten: { length: 40, weightPerLength: 2.72, pickPoints: [0, 20, 40] },
  items: [{ weight: 200, at: 20 }],
  arbor: { emptyWeight: 90, capacity: 1400, stackLength: 72 },
  bricks: [{ name: 'full', weight: 19.5, thickness: 2, available: 100 }],
}

const TARGETS: Target[] = [
  {
    method: 'put',
    path: () => '/api/v1/venue',
    valid: () => ({
      name: 'V',
      unitSystem: 'imperial',
      balanceTolerance: 10,
      ropeLockHolding: 50,
      wireRopeDesignFactor: 8,
      version: 999,
    }),
  },
  { method: 'post', path: () => '/api/v1/linesets', valid: () => ({ ...sampleLineset(500) }) as Record<string, Json> },
  {
    method: 'put',
    path: (v) => `/api/v1/linesets/${v.linesetId}`,
    valid: () => ({ ...sampleLineset(1), version: 999 }) as Record<string, Json>,
  },
  {
    method: 'post',
    path: () => '/api/v1/brick-types',
    valid: () => sampleBrickType('Fuzz'),
  },
  {
    method: 'put',
    path: (v) => `/api/v1/brick-types/${v.brickTypeId}`,
    valid: () => sampleBrickType('Full', { version: 999 }),
  },
  {
    method: 'put',
    path: (v) => `/api/v1/linesets/${v.linesetId}/arbor`,
    valid: (v) => ({ version: 999, bricks: [{ brickTypeId: v.brickTypeId, count: 3 }], note: 'Fuzz' }),
  },
  {
    method: 'post',
    path: (v) => `/api/v1/linesets/${v.linesetId}/lockout`,
    valid: () => ({ reason: 'Fuzz' }),
  },
  {
    method: 'post',
    path: () => '/api/v1/item-types',
    valid: () => ({
      name: 'Fuzz',
      category: 'lighting',
      unitWeight: 11,
      allowancePerUnit: 1.5,
      unitSystem: 'imperial',
    }),
  },
  {
    method: 'post',
    path: (v) => `/api/v1/linesets/${v.linesetId}/hangs`,
    valid: () =>
      ({
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
      }) as Record<string, Json>,
  },
  {
    method: 'put',
    path: (v) => `/api/v1/item-types/${v.brickTypeId}`,
    valid: () => ({
      name: 'Fuzz',
      category: 'lighting',
      unitWeight: 11,
      allowancePerUnit: 1,
      unitSystem: 'imperial',
      version: 0,
    }),
  },
  {
    method: 'put',
    path: (v) => `/api/v1/productions/${v.brickTypeId}`,
    valid: () => ({
      name: 'Fuzz',
      firstPerformance: '2026-11-20',
      lastPerformance: '2027-01-10',
      state: 'running',
      version: 0,
    }),
  },
  {
    method: 'post',
    path: () => '/api/v1/productions',
    valid: () => ({ name: 'Fuzz', firstPerformance: '2026-11-20', lastPerformance: '2027-01-10', state: 'planning' }),
  },
  {
    method: 'post',
    path: () => '/api/v1/people',
    valid: () => ({ email: 'fuzz@alpha.test', name: 'Fuzz', role: 'stage-manager' }),
  },
  {
    method: 'put',
    path: (v) => `/api/v1/people/${v.membershipIds['stage-manager']}`,
    valid: () => ({ role: 'stage-manager', version: 999 }),
  },
  // Ticket bodies name a hang or a ticket no venue has, so even a body the fuzz leaves valid writes nothing.
  { method: 'post', path: () => '/api/v1/tickets', valid: (v) => ({ hangId: v.brickTypeId }) },
  {
    method: 'post',
    path: (v) => `/api/v1/tickets/${v.brickTypeId}/approve`,
    valid: () => ({ version: 0, comment: 'Fuzz' }),
  },
  {
    method: 'post',
    path: (v) => `/api/v1/tickets/${v.brickTypeId}/decline`,
    valid: () => ({ version: 0, comment: 'Fuzz' }),
  },
  { method: 'post', path: (v) => `/api/v1/tickets/${v.brickTypeId}/withdraw`, valid: () => ({ version: 0 }) },
  {
    method: 'post',
    path: (v) => `/api/v1/tickets/${v.brickTypeId}/complete`,
    valid: (v) => ({
      version: 2,
      loaded: [{ brickTypeId: v.brickTypeId, count: 3 }],
      feltBalance: 'balanced',
      note: 'Fuzz',
    }),
  },
  { method: 'post', path: () => '/api/v1/calculations', valid: () => calculation as Record<string, Json> },
  // Without a file an upload is always refused; the multipart upload has its own generated bodies below.
  { method: 'post', path: (v) => `/api/v1/linesets/${v.linesetId}/attachments`, valid: () => ({ hangItemId: null }) },
  { method: 'post', path: () => '/api/v1/pre-run-checks', valid: () => ({ note: 'Fuzz check', productionId: null }) },
  { method: 'post', path: () => '/api/v1/invitations/lookup', valid: () => ({ token: 'a'.repeat(43) }) },
  {
    method: 'post',
    path: () => '/api/v1/invitations/accept',
    valid: () => ({ token: 'a'.repeat(43), name: 'Fuzz', password: 'a-long-password-here' }),
  },
]

const oddValues: Json[] = [
  null,
  true,
  '',
  '\u0000',
  'a\u0000b',
  '\ud800',
  'x\udfff',
  'x'.repeat(5000),
  1e308,
  -1e308,
  1e21,
  1e-308,
  1e-7,
  -1,
  0,
  2147483647,
  2 ** 53,
  '1e999',
  'NaN',
  ' 12 ',
  '\u202E',
  '\u2028',
  '\t\u0007',
  0.1 + 0.2,
  100000000000,
  [1e308],
  { length: 1 },
  [],
  {},
  [[[]]],
  { $gt: 1 },
]
const oddValue: fc.Arbitrary<Json> = fc.oneof(
  fc.constantFrom(...oddValues),
  fc.string(),
  fc.string({ unit: 'binary', maxLength: 40 }),
  fc.string({ unit: fc.integer({ min: 0, max: 0x1f }).map((code) => String.fromCharCode(code)), maxLength: 5 }),
  fc.integer(),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.jsonValue({ maxDepth: 2 }) as fc.Arbitrary<Json>,
)

/** Every path to a value inside a body, nested objects and arrays included (two levels down). */
function pathsOf(value: Json, prefix: (string | number)[] = [], depth = 0): (string | number)[][] {
  if (depth > 2 || value === null || typeof value !== 'object') return [prefix]
  const keys: (string | number)[] = Array.isArray(value) ? value.map((_, index) => index) : Object.keys(value)
  return [prefix, ...keys.flatMap((key) => pathsOf((value as Record<string, Json>)[key]!, [...prefix, key], depth + 1))]
}

function withValueAt(body: Json, path: (string | number)[], replacement: Json): Json {
  if (path.length === 0) return replacement
  const copy = JSON.parse(JSON.stringify(body)) as Record<string | number, Json>
  let cursor = copy
  for (const key of path.slice(0, -1)) cursor = cursor[key] as Record<string | number, Json>
  cursor[path.at(-1)!] = replacement
  return copy
}

const badBody = (valid: Record<string, Json>) =>
  fc.oneof(
    {
      weight: 4,
      arbitrary: fc
        .tuple(fc.constantFrom(...pathsOf(valid)), oddValue)
        .map(([path, odd]) => withValueAt(valid, path, odd)),
    },
    {
      weight: 1,
      arbitrary: fc.constantFrom(...Object.keys(valid)).map((key) => ({ ...valid, [key]: undefined }) as Json),
    },
    { weight: 1, arbitrary: fc.jsonValue({ maxDepth: 3 }) as fc.Arbitrary<Json> },
  )

const suite = venueSuite('administrator')

async function expectCleanAnswer(send: () => PromiseLike<{ status: number; text: string; body: unknown }>) {
  // An accepted request's mail is delivered after its answer; let it land so its outbox row stands still.
  await suite.app.handle.context.outbox.idle()
  const before = await databaseFingerprint(suite.app.handle.db.sequelize)
  const res = await send()
  expect(res.status, res.text).toBeLessThan(500)
  expect(res.text).not.toMatch(/\n\s+at |node_modules|Sequelize|TypeError|RangeError/)
  if (res.status >= 400) {
    expect((res.body as { error?: { code?: unknown } }).error?.code, res.text).toEqual(expect.any(String))
    expect(await databaseFingerprint(suite.app.handle.db.sequelize)).toBe(before)
  }
}

describe('generated bad requests', () => {
  for (const target of TARGETS) {
    it(`when ${target.method.toUpperCase()} ${target.path({ linesetId: ':id', brickTypeId: ':id', membershipIds: { 'stage-manager': ':id' } } as VenueFixture)} gets odd bodies, then it never answers 500 and a refusal writes nothing`, async () => {
      await fc.assert(
        fc.asyncProperty(badBody(target.valid(suite.venue)), async (body) => {
          await expectCleanAnswer(() =>
            suite.client.agent[target.method](target.path(suite.venue))
              .set('X-CSRF-Token', suite.client.csrfToken)
              .set('Content-Type', 'application/json')
              .send(JSON.stringify(body) ?? 'null'),
          )
        }),
        { numRuns: 30, seed: 20261203 },
      )
    })
  }

  // The values a hostile probe found that once answered 500, tried at every field of every write route.
  const KNOWN_BAD: Json[] = ['a\u0000b', 'x\ud800', 1e21, 1e-308, 2147483647, 1e-7, 2.5e9]
  for (const target of TARGETS) {
    it(`when ${target.method.toUpperCase()} ${target.path({ linesetId: ':id', brickTypeId: ':id', membershipIds: { 'stage-manager': ':id' } } as VenueFixture)} gets each known bad value at each field, then none answers 500`, async () => {
      const valid = target.valid(suite.venue)
      for (const key of Object.keys(valid))
        for (const odd of KNOWN_BAD)
          await expectCleanAnswer(() =>
            suite.client.agent[target.method](target.path(suite.venue))
              .set('X-CSRF-Token', suite.client.csrfToken)
              .set('Content-Type', 'application/json')
              .send(JSON.stringify({ ...valid, [key]: odd })),
          )
    })
  }

  it('when bodies are not JSON at all or ids are odd, then the answer is a clear refusal', async () => {
    const raw = fc.oneof(
      fc.string(),
      fc.constantFrom('{"a":', '[1,2', '\u0000', '{"name": "\\ud800"}', 'null', '"x"', '1e999'),
    )
    await fc.assert(
      fc.asyncProperty(raw, fc.constantFrom('linesets', 'brick-types', 'people', 'invitations'), async (text, noun) => {
        await expectCleanAnswer(() =>
          suite.client.agent
            .post(`/api/v1/${noun}`)
            .set('X-CSRF-Token', suite.client.csrfToken)
            .set('Content-Type', 'application/json')
            .send(text),
        )
      }),
      { numRuns: 30, seed: 20261203 },
    )
    const id = fc.oneof(fc.string({ minLength: 1 }), fc.constantFrom('%00', '..%2F..', '0'.repeat(500), '%E0%A4%A'))
    await fc.assert(
      fc.asyncProperty(
        id,
        fc.constantFrom('linesets', 'brick-types', 'people', 'invitations', 'attachments'),
        async (odd, noun) => {
          await expectCleanAnswer(() =>
            suite.client.agent
              .delete(`/api/v1/${noun}/${encodeURIComponent(odd)}`)
              .set('X-CSRF-Token', suite.client.csrfToken),
          )
        },
      ),
      { numRuns: 30, seed: 20261203 },
    )
  })
})

describe('generated bad uploads', () => {
  const SIGNATURES = [
    Buffer.from('89504e470d0a1a0a', 'hex'), // PNG
    Buffer.from('ffd8ffe0', 'hex'), // JPEG
    Buffer.from('RIFF\x10\x00\x00\x00WEBPVP8 ', 'latin1'),
    Buffer.from('%PDF-1.7\n'),
    Buffer.from('MZ'),
    Buffer.from('<!doctype html><script>'),
    Buffer.alloc(0),
  ]
  const name = fc.tuple(
    fc.oneof(
      fc.string({ maxLength: 30 }),
      fc.string({ unit: 'binary', maxLength: 30 }),
      fc.constantFrom('../../x', '..\\x', '%2e%2e%2f', '.x', 'a\u202Eb', 'a\u0000b', 'a\r\nb', 'x'.repeat(400)),
    ),
    fc.constantFrom('.png', '.PNG', '.jpg', '.jpeg', '.webp', '.pdf', '.exe', '.html', '', '.'),
  )
  const fileNameHeader = (given: string) => {
    try {
      return `filename*=UTF-8''${encodeURIComponent(given)}`
    } catch {
      // A lone surrogate cannot be percent-encoded; send it as the raw bytes a careless client would.
      return `filename="${given.replace(/["\r\n\\]/g, '_')}"`
    }
  }
  const hangItemId = fc.option(fc.oneof(fc.uuid(), fc.string({ maxLength: 50 }), fc.constant('')), { nil: undefined })

  it('when POST /api/v1/linesets/:id/attachments gets odd names, contents and fields, then it never answers 500 and a refusal stores nothing', async () => {
    const storedFiles = () => readdirSync(suite.app.config.fileStorageDir, { recursive: true }).length
    await fc.assert(
      fc.asyncProperty(
        name,
        fc.constantFrom(...SIGNATURES),
        fc.uint8Array({ maxLength: 2048 }),
        hangItemId,
        fc.boolean(),
        async ([stem, ending], signature, rest, itemId, cutShort) => {
          const { body, contentType } = multipartBody({
            fileNameHeader: fileNameHeader(stem + ending),
            bytes: Buffer.concat([signature, rest]),
            fields: itemId === undefined ? {} : { hangItemId: itemId },
          })
          const filesBefore = storedFiles()
          await expectCleanAnswer(() =>
            suite.client.agent
              .post(`/api/v1/linesets/${suite.venue.linesetId}/attachments`)
              .set('X-CSRF-Token', suite.client.csrfToken)
              .set('Content-Type', contentType)
              .send(cutShort ? body.subarray(0, body.length - 20) : body)
              .then((res) => {
                if (res.status >= 400) expect(storedFiles()).toBe(filesBefore)
                return res
              }),
          )
        },
      ),
      { numRuns: 60, seed: 20261203 },
    )
  })
})
