import { ATTACHMENT_TYPES, fileSizeInWords, type AttachmentContentType } from '../../../shared/schemas/attachment.js'

interface AttachmentFacts {
  fileName?: string
  contentType?: string
  byteSize?: number
}

function described(facts: AttachmentFacts): string {
  const type = ATTACHMENT_TYPES[facts.contentType as AttachmentContentType]?.words
  const size = typeof facts.byteSize === 'number' ? fileSizeInWords(facts.byteSize) : undefined
  const details = [type, size].filter(Boolean).join(', ')
  return `“${facts.fileName ?? 'a file'}”${details ? ` (${details})` : ''}`
}

/** Words for the ledger entries of uploads and their removal; undefined for any other type. */
export function summarizeAttachmentEvent(type: string, payload: Record<string, unknown>): string | undefined {
  const facts = (payload.attachment ?? {}) as AttachmentFacts
  switch (type) {
    case 'attachment-added':
      return `Attached ${described(facts)}`
    case 'attachment-removed':
      return `Removed the attachment ${described(facts)}`
    default:
      return undefined
  }
}
