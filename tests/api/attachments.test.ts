import { createHash } from 'node:crypto'
import { readdirSync } from 'node:fs'
import sharp from 'sharp'
import { QueryTypes } from 'sequelize'
import { beforeAll, describe, expect, it } from 'vitest'
import type { ErrorBody } from '../../shared/errors/fields.js'
import { fileSizeInWords, MAX_ATTACHMENT_BYTES } from '../../shared/schemas/attachment.js'
import { seedVenue, type VenueFixture } from '../support/fixtures.js'
import { signedIn, type Client } from '../support/test-app.js'
import { sampleExecutable, sampleHtml, sampleImage, samplePdf } from '../support/upload-files.js'
import { venueSuite } from '../support/venue-suite.js'

const suite = venueSuite('fly-operator')
let director: Client
let stageManager: Client
let beta: VenueFixture
let betaDirector: Client
let png: Buffer

beforeAll(async () => {
  director = await signedIn(suite.app.url, suite.venue.emails['technical-director'])
  stageManager = await signedIn(suite.app.url, suite.venue.emails['stage-manager'])
  beta = await seedVenue(suite.app.handle.context, 'beta')
  betaDirector = await signedIn(suite.app.url, beta.emails['technical-director'])
  png = await sampleImage('png')
})

const attachmentsOf = (linesetId: string) => `/api/v1/linesets/${linesetId}/attachments`

function upload(client: Client, linesetId: string, bytes: Buffer, filename: string, fields = {}) {
  const request = client.agent.post(attachmentsOf(linesetId)).set('X-CSRF-Token', client.csrfToken)
  for (const [name, value] of Object.entries(fields)) request.field(name, value as string)
  return request.attach('file', bytes, { filename, contentType: 'application/octet-stream' })
}

const storedFiles = () => readdirSync(suite.app.config.fileStorageDir, { recursive: true }).map(String)
const attachmentCount = async () => {
  const [row] = await suite.app.handle.db.sequelize.query<{ count: string }>('SELECT count(*) FROM attachments', {
    type: QueryTypes.SELECT,
  })
  return Number(row!.count)
}

describe('uploading an attachment', () => {
  it('when a fly operator uploads a PNG, then it answers 201 with its digest and lists, downloads and thumbnails it', async () => {
    const res = await upload(suite.client, suite.venue.linesetId, png, 'Electric 1 hang photo.png').expect(201)
    const sha256 = createHash('sha256').update(png).digest('hex')
    expect(res.body).toMatchObject({
      fileName: 'Electric 1 hang photo.png',
      contentType: 'image/png',
      byteSize: png.length,
      sha256,
      hasThumbnail: true,
      linesetId: suite.venue.linesetId,
      uploadedBy: { id: suite.venue.members['fly-operator'].id },
    })

    const list = (await stageManager.get(attachmentsOf(suite.venue.linesetId)).expect(200)).body
    expect(list.map((a: { id: string }) => a.id)).toContain(res.body.id)

    const content = await stageManager.get(`/api/v1/attachments/${res.body.id}/content`).buffer(true).expect(200)
    expect(Buffer.compare(content.body as Buffer, png)).toBe(0)
    expect(content.headers['content-type']).toBe('image/png')
    expect(content.headers['x-content-type-options']).toBe('nosniff')
    expect(content.headers['content-disposition']).toBe('attachment; filename="Electric 1 hang photo.png"')

    const thumbnail = await stageManager.get(`/api/v1/attachments/${res.body.id}/thumbnail`).buffer(true).expect(200)
    expect(thumbnail.headers['content-type']).toBe('image/webp')
    const { format, width, height } = await sharp(thumbnail.body as Buffer).metadata()
    expect({ format, width, height }).toEqual({ format: 'webp', width: 320, height: 240 })

    // Stored under names the server made, none of which carries the name as given.
    expect(storedFiles().some((path) => path.includes('Electric'))).toBe(false)
    expect(storedFiles()).toEqual(
      expect.arrayContaining([
        `${suite.venue.venueId}/${res.body.id}`,
        `${suite.venue.venueId}/${res.body.id}-thumbnail.webp`,
      ]),
    )
  })

  it('when a JPEG, a WebP and a PDF are uploaded, then each keeps its type and only the images have thumbnails', async () => {
    const cases: Array<[Buffer, string, string, boolean]> = [
      [await sampleImage('jpeg'), 'Scale ticket.JPEG', 'image/jpeg', true],
      [await sampleImage('webp'), 'Gallery.webp', 'image/webp', true],
      [samplePdf, 'Drop drawing.pdf', 'application/pdf', false],
    ]
    for (const [bytes, name, type, thumbnail] of cases) {
      const res = await upload(director, suite.venue.linesetId, bytes, name).expect(201)
      expect(res.body).toMatchObject({ fileName: name, contentType: type, hasThumbnail: thumbnail })
      await stageManager.get(`/api/v1/attachments/${res.body.id}/thumbnail`).expect(thumbnail ? 200 : 404)
    }
  })

  it('when a name has quotes and letters beyond ASCII, then the download names it safely both ways', async () => {
    const res = await upload(suite.client, suite.venue.linesetId, samplePdf, 'Rigging "plot" – Ωmega.pdf').expect(201)
    const content = await stageManager.get(`/api/v1/attachments/${res.body.id}/content`).expect(200)
    expect(content.headers['content-disposition']).toBe(
      `attachment; filename="Rigging \\"plot\\" ? ?mega.pdf"; filename*=UTF-8''Rigging%20%22plot%22%20%E2%80%93%20%CE%A9mega.pdf`,
    )
  })

  it('when an item of one of the lineset’s hangs is named, then the attachment keeps it; another item is refused by field', async () => {
    const hang = await suite.client
      .post(`/api/v1/linesets/${suite.venue.linesetId}/hangs`, {
        title: 'Act one',
        basedOnRevision: null,
        unitSystem: 'imperial',
        items: [{ label: 'Drop', category: 'scenery', weight: 120, at: 20 }],
      })
      .expect(201)
    const [item] = await suite.app.handle.db.sequelize.query<{ id: string }>(
      'SELECT id FROM hang_items WHERE hang_id = $1',
      { bind: [hang.body.id], type: QueryTypes.SELECT },
    )
    const res = await upload(suite.client, suite.venue.linesetId, samplePdf, 'Drop scale ticket.pdf', {
      hangItemId: item!.id,
    }).expect(201)
    expect(res.body.hangItemId).toBe(item!.id)

    for (const hangItemId of ['not-an-id', '00000000-0000-4000-8000-000000000000']) {
      const refused = await upload(suite.client, suite.venue.linesetId, samplePdf, 'x.pdf', { hangItemId }).expect(400)
      expect(refused.body.error.fields).toHaveProperty('hangItemId')
    }
  })
})

describe('refused uploads leave nothing behind', () => {
  const refuses = async (send: () => PromiseLike<{ status: number; body: ErrorBody }>, status: number) => {
    const rowsBefore = await attachmentCount()
    const filesBefore = storedFiles().length
    const res = await send()
    expect(res.status, JSON.stringify(res.body)).toBe(status)
    expect(res.body.error.message).toEqual(expect.any(String))
    expect(await attachmentCount()).toBe(rowsBefore)
    expect(storedFiles()).toHaveLength(filesBefore)
    return res.body.error
  }

  it('when a file is one byte over 10 MB, then it answers 413; exactly 10 MB passes the size check', async () => {
    const over = Buffer.concat([samplePdf, Buffer.alloc(MAX_ATTACHMENT_BYTES + 1 - samplePdf.length)])
    const error = await refuses(() => upload(suite.client, suite.venue.linesetId, over, 'Big.pdf'), 413)
    expect(error.code).toBe('too_large')
    const exact = over.subarray(0, MAX_ATTACHMENT_BYTES)
    await upload(suite.client, suite.venue.linesetId, exact, 'Exactly ten.pdf').expect(201)
  })

  it('when a program or a web page is renamed to .png, or a PNG to .pdf, then it answers 415 in words', async () => {
    for (const [bytes, name] of [
      [sampleExecutable, 'photo.png'],
      [sampleHtml, 'photo.png'],
      [sampleHtml, 'drawing.pdf'],
      [png, 'drawing.pdf'],
      [sampleExecutable, 'setup.exe'],
      [png, 'no ending'],
      [Buffer.from('GIF89a\x01\x00\x01\x00'), 'small.gif'],
    ] as const) {
      const error = await refuses(() => upload(suite.client, suite.venue.linesetId, bytes, name), 415)
      expect(error.code, name).toBe('unsupported_file_type')
    }
  })

  it('when a file name carries a path, control characters or invisible characters, then it answers 400 on the file field', async () => {
    const names = [
      '../../etc/passwd.png',
      '..\\..\\boot.png',
      'linesets/12.png',
      '/etc/hosts.png',
      '%2e%2e%2fsecret.png',
      '.htaccess.png',
      'bell\u0007.png',
      'line\nbreak.png',
      'nul\u0000.png',
      'photo\u202Egnp.exe.png',
      `${'x'.repeat(300)}.png`,
    ]
    for (const name of names) {
      const error = await refuses(() => rawUpload(name, png), 400)
      expect(error.fields?.file, JSON.stringify(name)).toEqual(expect.any(String))
    }
  })

  it('when the request has no file, the wrong field or two files, then it answers 400', async () => {
    await refuses(() => suite.client.post(attachmentsOf(suite.venue.linesetId), { file: 'x' }), 400)
    await refuses(
      () =>
        suite.client.agent
          .post(attachmentsOf(suite.venue.linesetId))
          .set('X-CSRF-Token', suite.client.csrfToken)
          .attach('photo', png, 'a.png'),
      400,
    )
    await refuses(
      () =>
        suite.client.agent
          .post(attachmentsOf(suite.venue.linesetId))
          .set('X-CSRF-Token', suite.client.csrfToken)
          .attach('file', png, 'a.png')
          .attach('file', png, 'b.png'),
      400,
    )
  })

  it('when a stage manager uploads, then it answers 403 and stores nothing', async () => {
    await refuses(() => upload(stageManager, suite.venue.linesetId, png, 'a.png'), 403)
  })
})

/** Sends a name byte for byte, as RFC 5987 `filename*` so every character arrives exactly as written. */
function rawUpload(name: string, bytes: Buffer) {
  const boundary = '----loftledger-test'
  const body = Buffer.concat([
    Buffer.from(
      `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename*=UTF-8''${encodeURIComponent(name)}\r\n` +
        'Content-Type: application/octet-stream\r\n\r\n',
    ),
    bytes,
    Buffer.from(`\r\n--${boundary}--\r\n`),
  ])
  return suite.client.agent
    .post(attachmentsOf(suite.venue.linesetId))
    .set('X-CSRF-Token', suite.client.csrfToken)
    .set('Content-Type', `multipart/form-data; boundary=${boundary}`)
    .send(body)
}

describe('another venue and who may delete', () => {
  it("when another venue's lineset or attachment is named, then every route answers 404", async () => {
    const theirs = await upload(betaDirector, beta.linesetId, png, 'Theirs.png').expect(201)
    await upload(suite.client, beta.linesetId, png, 'a.png').expect(404)
    await suite.client.get(attachmentsOf(beta.linesetId)).expect(404)
    await suite.client.get(`/api/v1/attachments/${theirs.body.id}/content`).expect(404)
    await suite.client.get(`/api/v1/attachments/${theirs.body.id}/thumbnail`).expect(404)
    await director.delete(`/api/v1/attachments/${theirs.body.id}`).expect(404)
    await betaDirector.get(`/api/v1/attachments/${theirs.body.id}/content`).expect(200)
  })

  it('when a fly operator deletes what a director uploaded, then 403; their own, or a director deleting theirs, then 204', async () => {
    const directors = await upload(director, suite.venue.linesetId, samplePdf, 'Director.pdf').expect(201)
    await suite.client.delete(`/api/v1/attachments/${directors.body.id}`).expect(403)
    const own = await upload(suite.client, suite.venue.linesetId, png, 'Own.png').expect(201)
    await suite.client.delete(`/api/v1/attachments/${own.body.id}`).expect(204)
    await director.delete(`/api/v1/attachments/${directors.body.id}`).expect(204)
    await suite.client.get(`/api/v1/attachments/${own.body.id}/content`).expect(404)
    expect(storedFiles().some((path) => path.includes(own.body.id))).toBe(false)
    expect(storedFiles().some((path) => path.includes(directors.body.id))).toBe(false)
    await director.delete(`/api/v1/attachments/${directors.body.id}`).expect(404)
  })

  it('when an upload and a delete happen, then the ledger has an entry for each in words', async () => {
    const res = await upload(suite.client, suite.venue.linesetId, png, 'Ledger.png').expect(201)
    await director.delete(`/api/v1/attachments/${res.body.id}`).expect(204)
    const { events } = (await stageManager.get(`/api/v1/linesets/${suite.venue.linesetId}/events?limit=5`)).body
    const size = fileSizeInWords(png.length)
    expect(events[0]).toMatchObject({
      type: 'attachment-removed',
      summary: `Removed the attachment “Ledger.png” (PNG image, ${size})`,
      actor: { id: suite.venue.members['technical-director'].id },
    })
    expect(events[1]).toMatchObject({
      type: 'attachment-added',
      summary: `Attached “Ledger.png” (PNG image, ${size})`,
      payload: { attachment: { id: res.body.id, sha256: res.body.sha256, byteSize: png.length } },
    })
  })
})
