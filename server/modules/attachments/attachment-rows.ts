import type { Attachment, AttachmentContentType } from '../../../shared/schemas/attachment.js'
import type { TransactionContext } from '../../context.js'
import { notFound } from '../../http/errors.js'
import { rows } from '../brick-stock/stock-sql.js'

/** An attachment row as the services read it. */
export interface AttachmentRow {
  id: string
  linesetId: string
  hangItemId: string | null
  fileName: string
  contentType: AttachmentContentType
  byteSize: string
  sha256: string
  storageKey: string
  thumbnailKey: string | null
  uploadedBy: string | null
  uploadedByName: string | null
  createdAt: Date
}

export const ATTACHMENT_COLUMNS = `a.id, a.lineset_id AS "linesetId", a.hang_item_id AS "hangItemId",
  a.file_name AS "fileName", a.content_type AS "contentType", a.byte_size AS "byteSize", a.sha256,
  a.storage_key AS "storageKey", a.thumbnail_key AS "thumbnailKey", a.uploaded_by AS "uploadedBy",
  u.name AS "uploadedByName", a.created_at AS "createdAt"`

/** One of the venue's attachments (404 for another venue's, or none); `lock` holds it for a delete. */
export async function attachmentRow(tx: TransactionContext, id: string, lock = false): Promise<AttachmentRow> {
  const [row] = await rows<AttachmentRow>(
    tx,
    `SELECT ${ATTACHMENT_COLUMNS} FROM attachments a LEFT JOIN users u ON u.id = a.uploaded_by
      WHERE a.id = $1 AND a.venue_id = $2 ${lock ? 'FOR UPDATE OF a' : ''}`,
    [id, tx.actor.venueId],
  )
  if (!row) throw notFound('That attachment')
  return row
}

/** The API's view of a row. */
export function attachmentView(row: AttachmentRow): Attachment {
  return {
    id: row.id,
    linesetId: row.linesetId,
    hangItemId: row.hangItemId,
    fileName: row.fileName,
    contentType: row.contentType,
    byteSize: Number(row.byteSize),
    sha256: row.sha256,
    hasThumbnail: row.thumbnailKey !== null,
    uploadedBy: row.uploadedBy ? { id: row.uploadedBy, name: row.uploadedByName ?? '' } : null,
    uploadedAt: new Date(row.createdAt).toISOString(),
  }
}
