import { z } from 'zod'
import { singleLineText } from './text.js'

/** The largest file an upload may carry: 10 MiB. */
export const MAX_ATTACHMENT_BYTES = 10 * 1024 * 1024

/** The longest file name kept, in characters. */
export const MAX_ATTACHMENT_NAME = 200

/** What may be attached, by content type: the name's endings that go with it and how a person calls it. */
export const ATTACHMENT_TYPES = {
  'image/jpeg': { extensions: ['jpg', 'jpeg'], words: 'JPEG photo' },
  'image/png': { extensions: ['png'], words: 'PNG image' },
  'image/webp': { extensions: ['webp'], words: 'WebP image' },
  'application/pdf': { extensions: ['pdf'], words: 'PDF document' },
} as const satisfies Record<string, { extensions: readonly string[]; words: string }>

export type AttachmentContentType = keyof typeof ATTACHMENT_TYPES

/** The name endings accepted, as a file picker's `accept` list: `.jpg,.jpeg,.png,.webp,.pdf`. */
export const ATTACHMENT_ACCEPT = Object.values(ATTACHMENT_TYPES)
  .flatMap((type) => type.extensions.map((extension) => `.${extension}`))
  .join(',')

/**
 * The content type a file name's ending promises, or undefined when the ending is not one we take.
 *
 * @example
 * contentTypeForName('Scale ticket.PDF') // 'application/pdf'
 * contentTypeForName('setup.exe') // undefined
 */
export function contentTypeForName(name: string): AttachmentContentType | undefined {
  const extension = /\.([^.]+)$/.exec(name)?.[1]?.toLowerCase()
  if (!extension) return undefined
  return (Object.keys(ATTACHMENT_TYPES) as AttachmentContentType[]).find((type) =>
    (ATTACHMENT_TYPES[type].extensions as readonly string[]).includes(extension),
  )
}

// Bidirectional overrides and other invisible format characters can make "gnp.exe" read as "exe.png".
const INVISIBLE = /\p{Cf}/u
// A slash or backslash, raw or percent-encoded, or an encoded dot: a name that tries to be a path.
const PATH_PARTS = /[/\\]|%2f|%5c|%2e/i

/**
 * A file's name as given by the person uploading it: one line of text (the one text rule), no path, no
 * invisible characters, not hidden (a leading dot), at most 200 characters. Refused, never cleaned.
 *
 * @example
 * attachmentFileNameSchema.safeParse('../../etc/passwd').success // false
 * attachmentFileNameSchema.parse('Scale ticket 12.pdf') // 'Scale ticket 12.pdf'
 */
export const attachmentFileNameSchema = singleLineText('File name', MAX_ATTACHMENT_NAME, { required: true })
  .refine((name) => !PATH_PARTS.test(name), 'File name cannot hold a path (no / or \\)')
  .refine((name) => !name.startsWith('.'), 'File name cannot start with a dot')
  .refine((name) => !INVISIBLE.test(name), 'File name cannot hold invisible formatting characters')

/** The text fields that may come with an upload: the hang revision item it belongs to, if any. */
export const attachmentUploadFieldsSchema = z.object({
  hangItemId: z.preprocess(
    (value) => (value === '' ? undefined : value),
    z.uuid('Hang item must be the id of an item of one of this lineset’s hangs').optional(),
  ),
})
export type AttachmentUploadFields = z.infer<typeof attachmentUploadFieldsSchema>

/** An attachment as the API shows it. */
export interface Attachment {
  id: string
  linesetId: string
  hangItemId: string | null
  fileName: string
  contentType: AttachmentContentType
  byteSize: number
  sha256: string
  hasThumbnail: boolean
  uploadedBy: { id: string; name: string } | null
  /** ISO time. */
  uploadedAt: string
}

/**
 * A file's size in words, in the units people see on their own computers (1 KB = 1,024 bytes).
 *
 * @example
 * fileSizeInWords(2_621_440) // '2.5 MB'
 * fileSizeInWords(900) // '900 bytes'
 */
export function fileSizeInWords(bytes: number): string {
  if (bytes < 1024) return bytes === 1 ? '1 byte' : `${bytes} bytes`
  const [size, unit] = bytes < 1024 * 1024 ? [bytes / 1024, 'KB'] : [bytes / 1024 / 1024, 'MB']
  return `${Number(size.toFixed(size < 10 ? 1 : 0))} ${unit}`
}
