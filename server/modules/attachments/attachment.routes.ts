import { Router, type Response } from 'express'
import { attachmentUploadFieldsSchema } from '../../../shared/schemas/attachment.js'
import { idParamsSchema } from '../../../shared/schemas/id.js'
import { HANG_EDITORS, ROLES } from '../../../shared/schemas/role.js'
import { memberContext, type AppContext } from '../../context.js'
import { requireRole } from '../../http/auth.js'
import { validate } from '../../http/validate.js'
import { readUpload } from './attachment-upload.js'
import { readAttachmentFile, listAttachments, type StoredFile } from './attachment-read.service.js'
import { deleteAttachment, uploadAttachment } from './attachment.service.js'

const byId = validate({ params: idParamsSchema })

/** `/linesets/:id/attachments`: everyone lists, the fly crew and those who approve upload. */
export function linesetAttachmentRoutes(app: AppContext) {
  const router = Router()
  router.get('/:id/attachments', requireRole(ROLES), byId, async (req, res) => {
    res.json(await listAttachments(memberContext(app, req), req.params.id as string))
  })
  router.post(
    '/:id/attachments',
    requireRole(HANG_EDITORS),
    byId,
    readUpload,
    validate({ body: attachmentUploadFieldsSchema }),
    async (req, res) => {
      const upload = { fileName: req.file!.originalname, bytes: req.file!.buffer }
      res.status(201).json(await uploadAttachment(memberContext(app, req), req.params.id as string, upload, req.body))
    },
  )
  return router
}

/** Sends a stored file as a download only: never shown inline, never sniffed into another type. */
function sendFile(res: Response, file: StoredFile, asDownload: boolean) {
  // res.attachment writes a quoted ASCII fallback and an RFC 5987 UTF-8 name, escaping quotes and controls.
  if (asDownload) res.attachment(file.attachment.fileName)
  res.set({
    'Content-Type': file.contentType,
    'Content-Length': String(file.bytes.length),
    'X-Content-Type-Options': 'nosniff',
    'Content-Security-Policy': "default-src 'none'; sandbox",
    'Cache-Control': 'private, no-store',
  })
  res.end(file.bytes)
}

/** `/attachments/:id`: download and thumbnail for everyone; delete by directors, administrators and the uploader. */
export function attachmentRoutes(app: AppContext) {
  const router = Router()
  router.get('/:id/content', requireRole(ROLES), byId, async (req, res) => {
    sendFile(res, await readAttachmentFile(memberContext(app, req), req.params.id as string, 'content'), true)
  })
  router.get('/:id/thumbnail', requireRole(ROLES), byId, async (req, res) => {
    sendFile(res, await readAttachmentFile(memberContext(app, req), req.params.id as string, 'thumbnail'), false)
  })
  router.delete('/:id', requireRole(HANG_EDITORS), byId, async (req, res) => {
    await deleteAttachment(memberContext(app, req), req.params.id as string)
    res.status(204).end()
  })
  return router
}
