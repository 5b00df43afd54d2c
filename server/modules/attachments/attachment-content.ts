import { fileTypeFromBuffer } from 'file-type'
import sharp from 'sharp'
import {
  ATTACHMENT_TYPES,
  attachmentFileNameSchema,
  contentTypeForName,
  type AttachmentContentType,
} from '../../../shared/schemas/attachment.js'
import { AppError } from '../../http/errors.js'

const ALLOWED_NAMES = Object.values(ATTACHMENT_TYPES)
  .flatMap((type) => type.extensions)
  .join(', ')

const notAllowed = (message: string) => new AppError(415, 'unsupported_file_type', message)

/** The name as given, by the one file name rule; 400 naming the `file` field otherwise. */
export function checkedFileName(given: string): string {
  const parsed = attachmentFileNameSchema.safeParse(given)
  if (parsed.success) return parsed.data
  const message = parsed.error.issues[0]!.message
  throw new AppError(400, 'invalid_file_name', message, { file: message })
}

/**
 * What the bytes are, by their content (never by the name or the type the browser claimed): one of the types
 * we take, and the one the name's ending promises; 415 otherwise, in words.
 */
export async function checkedContentType(fileName: string, bytes: Buffer): Promise<AttachmentContentType> {
  const promised = contentTypeForName(fileName)
  if (!promised) throw notAllowed(`Only photos and drawings can be attached: a name ending in ${ALLOWED_NAMES}`)
  const found = await fileTypeFromBuffer(bytes)
  const actual = found && found.mime in ATTACHMENT_TYPES ? (found.mime as AttachmentContentType) : undefined
  if (!actual)
    throw notAllowed(
      `“${fileName}” is not a ${ATTACHMENT_TYPES[promised].words} inside` +
        (found ? ` (its content is ${found.ext.toUpperCase()})` : ' (its content is not a photo or a PDF)'),
    )
  if (actual !== promised)
    throw notAllowed(
      `“${fileName}” holds a ${ATTACHMENT_TYPES[actual].words}, but its name ends like a ${ATTACHMENT_TYPES[promised].words}`,
    )
  return actual
}

// A 10 MB file can still declare an enormous image; decoding stops past about 60 megapixels.
const PIXEL_LIMIT = 60_000_000
/** The longest side of a thumbnail, in pixels. */
export const THUMBNAIL_SIZE = 320

/**
 * A small WebP of an image, turned upright by its EXIF orientation; null for a PDF. A file that passed the
 * content check but cannot be decoded (cut short, damaged) is refused with 415.
 */
export async function thumbnailOf(contentType: AttachmentContentType, bytes: Buffer): Promise<Buffer | null> {
  if (!contentType.startsWith('image/')) return null
  try {
    return await sharp(bytes, { limitInputPixels: PIXEL_LIMIT, failOn: 'error' })
      .rotate()
      .resize(THUMBNAIL_SIZE, THUMBNAIL_SIZE, { fit: 'inside', withoutEnlargement: true })
      .webp({ quality: 75 })
      .toBuffer()
  } catch {
    throw new AppError(415, 'unreadable_image', 'The image could not be read: it may be damaged or too large to open')
  }
}
