import { createHash, randomUUID } from 'node:crypto'
import type { Attachment, AttachmentUploadFields } from '../../../shared/schemas/attachment.js'
import { canEditInventory } from '../../../shared/schemas/role.js'
import { inTransaction, type ServiceContext, type TransactionContext } from '../../context.js'
import { AppError, forbidden, notFound } from '../../http/errors.js'
import { rows } from '../brick-stock/stock-sql.js'
import { recordLinesetChange } from '../linesets/lineset-history.js'
import { checkedContentType, checkedFileName, thumbnailOf } from './attachment-content.js'
import { attachmentRow, attachmentView, type AttachmentRow } from './attachment-rows.js'
import { fromStorage, removeQuietly } from './attachment-storage.js'

/** A file as it arrived: the name the person gave and its bytes. */
export interface Upload {
  fileName: string
  bytes: Buffer
}

/** 404 unless the lineset is the venue's and in use; 400 unless the hang item is an item of its hangs. */
async function checkTarget(tx: TransactionContext, linesetId: string, hangItemId: string | undefined) {
  const [lineset] = await rows(
    tx,
    'SELECT id FROM linesets WHERE id = $1 AND venue_id = $2 AND retired_at IS NULL FOR SHARE',
    [linesetId, tx.actor.venueId],
  )
  if (!lineset) throw notFound('That lineset')
  if (!hangItemId) return
  const [item] = await rows(
    tx,
    `SELECT i.id FROM hang_items i JOIN hangs h ON h.id = i.hang_id
      WHERE i.id = $1 AND i.venue_id = $2 AND h.lineset_id = $3`,
    [hangItemId, tx.actor.venueId, linesetId],
  )
  const message = 'Hang item must be an item of one of this lineset’s hang revisions'
  if (!item) throw new AppError(400, 'validation_failed', message, { hangItemId: message })
}

const ledgerPayload = (row: Pick<AttachmentRow, 'id' | 'fileName' | 'contentType' | 'byteSize' | 'sha256'>) => ({
  attachment: {
    id: row.id,
    fileName: row.fileName,
    contentType: row.contentType,
    byteSize: Number(row.byteSize),
    sha256: row.sha256,
  },
})

/**
 * Attaches a file to a lineset (and optionally to an item of one of its hangs). The name and the content are
 * checked first (400, 415); the file and an image's thumbnail are then stored under names the server makes;
 * last, one transaction writes the row and its ledger entry. Nothing is half-written: a store that fails
 * writes no row, and a row that cannot be written removes what was stored.
 */
export async function uploadAttachment(
  ctx: ServiceContext,
  linesetId: string,
  upload: Upload,
  fields: AttachmentUploadFields,
): Promise<Attachment> {
  const fileName = checkedFileName(upload.fileName)
  const contentType = await checkedContentType(fileName, upload.bytes)
  await inTransaction(ctx, (tx) => checkTarget(tx, linesetId, fields.hangItemId))
  const thumbnail = await thumbnailOf(contentType, upload.bytes)
  const id = randomUUID()
  const storageKey = `${ctx.actor.venueId}/${id}`
  const thumbnailKey = thumbnail ? `${ctx.actor.venueId}/${id}-thumbnail.webp` : null
  try {
    await fromStorage(() => ctx.files.put(storageKey, upload.bytes, contentType))
    if (thumbnail && thumbnailKey) await fromStorage(() => ctx.files.put(thumbnailKey, thumbnail, 'image/webp'))
    return await inTransaction(ctx, async (tx) => {
      await checkTarget(tx, linesetId, fields.hangItemId)
      const row = {
        id,
        fileName,
        contentType,
        byteSize: String(upload.bytes.length),
        sha256: createHash('sha256').update(upload.bytes).digest('hex'),
      }
      await rows(
        tx,
        `INSERT INTO attachments (id, venue_id, lineset_id, hang_item_id, file_name, content_type, byte_size, sha256,
           storage_key, thumbnail_key, uploaded_by, created_at)
         VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10, $11, $12) RETURNING id`,
        [
          id,
          tx.actor.venueId,
          linesetId,
          fields.hangItemId ?? null,
          fileName,
          contentType,
          row.byteSize,
          row.sha256,
          storageKey,
          thumbnailKey,
          tx.actor.id,
          tx.clock.now(),
        ],
      )
      await recordLinesetChange(tx, 'attachment-added', linesetId, ledgerPayload(row))
      return attachmentRow(tx, id).then(attachmentView)
    })
  } catch (error) {
    await removeQuietly(ctx.files, [storageKey, thumbnailKey])
    throw error
  }
}

/**
 * Deletes an attachment: technical directors and administrators any, a fly operator only what they uploaded
 * (403 otherwise). The row goes with a ledger entry in one transaction; the stored files go after it commits.
 */
export async function deleteAttachment(ctx: ServiceContext, id: string): Promise<void> {
  const removed = await inTransaction(ctx, async (tx) => {
    const row = await attachmentRow(tx, id, true)
    if (!canEditInventory(tx.actor.role) && row.uploadedBy !== tx.actor.id) throw forbidden()
    const deleted = await rows(tx, 'DELETE FROM attachments WHERE id = $1 AND venue_id = $2 RETURNING id', [
      id,
      tx.actor.venueId,
    ])
    if (!deleted.length) throw notFound('That attachment')
    await recordLinesetChange(tx, 'attachment-removed', row.linesetId, ledgerPayload(row))
    return row
  })
  await removeQuietly(ctx.files, [removed.storageKey, removed.thumbnailKey])
}
