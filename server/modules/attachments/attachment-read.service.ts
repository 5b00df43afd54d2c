import type { Attachment } from '../../../shared/schemas/attachment.js'
import { inTransaction, type ServiceContext } from '../../context.js'
import { AppError, notFound } from '../../http/errors.js'
import { rows } from '../brick-stock/stock-sql.js'
import { ATTACHMENT_COLUMNS, attachmentRow, attachmentView, type AttachmentRow } from './attachment-rows.js'
import { fromStorage } from './attachment-storage.js'

/** A lineset's attachments, newest first (404 for another venue's lineset). */
export function listAttachments(ctx: ServiceContext, linesetId: string): Promise<Attachment[]> {
  return inTransaction(ctx, async (tx) => {
    const [lineset] = await rows(tx, 'SELECT id FROM linesets WHERE id = $1 AND venue_id = $2', [
      linesetId,
      tx.actor.venueId,
    ])
    if (!lineset) throw notFound('That lineset')
    const found = await rows<AttachmentRow>(
      tx,
      `SELECT ${ATTACHMENT_COLUMNS} FROM attachments a LEFT JOIN users u ON u.id = a.uploaded_by
        WHERE a.venue_id = $1 AND a.lineset_id = $2 ORDER BY a.created_at DESC, a.id`,
      [tx.actor.venueId, linesetId],
    )
    return found.map(attachmentView)
  })
}

/** A stored file with what a download needs to say about it. */
export interface StoredFile {
  attachment: Attachment
  contentType: string
  bytes: Buffer
}

const missing = () =>
  new AppError(404, 'file_missing', 'The stored file for that attachment is missing; ask an administrator')

/** An attachment's file, or its thumbnail (404 when it has none): checked by venue like every read. */
export async function readAttachmentFile(
  ctx: ServiceContext,
  id: string,
  which: 'content' | 'thumbnail',
): Promise<StoredFile> {
  const row = await inTransaction(ctx, (tx) => attachmentRow(tx, id))
  const key = which === 'content' ? row.storageKey : row.thumbnailKey
  if (!key) throw notFound('A thumbnail of that attachment')
  const bytes = await fromStorage(() => ctx.files.get(key))
  if (!bytes) throw missing()
  return { attachment: attachmentView(row), contentType: which === 'content' ? row.contentType : 'image/webp', bytes }
}
