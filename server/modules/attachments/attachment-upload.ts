import type { RequestHandler } from 'express'
import multer from 'multer'
import { MAX_ATTACHMENT_BYTES } from '../../../shared/schemas/attachment.js'
import { AppError } from '../../http/errors.js'

// One file in field `file` and a few short text fields; the whole upload is held in memory (10 MB at most)
// so its content can be checked before anything is stored.
const parser = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_ATTACHMENT_BYTES, files: 1, fields: 4, fieldSize: 200, parts: 6 },
  // Keep the name exactly as sent, path included, so a path trick is refused rather than quietly cut off.
  preservePath: true,
  defParamCharset: 'utf8',
}).single('file')

const MULTER_WORDS: Record<string, [number, string, string]> = {
  LIMIT_FILE_SIZE: [413, 'too_large', `The file is larger than ${MAX_ATTACHMENT_BYTES / 1024 / 1024} MB`],
  LIMIT_FILE_COUNT: [400, 'invalid_upload', 'Send one file at a time'],
  LIMIT_UNEXPECTED_FILE: [400, 'invalid_upload', 'Send the file in the field named “file”, one at a time'],
}

/** What the multipart reader refused, in the one error shape: 413 too large, 400 for the rest. */
function uploadRefusal(error: unknown): AppError {
  if (error instanceof multer.MulterError) {
    const [status, code, message] = MULTER_WORDS[error.code] ?? [400, 'invalid_upload', 'The upload could not be read']
    return new AppError(status, code, message, { file: message })
  }
  if (error instanceof AppError) return error
  // busboy's own words for a malformed body ("Unexpected end of form", "Malformed part header").
  return new AppError(400, 'invalid_upload', 'The upload could not be read: it is not a complete form')
}

/**
 * Reads a `multipart/form-data` upload into `req.file` (in memory) and `req.body` (its text fields); a request
 * without a file, or that is not a form at all, is refused by naming the `file` field.
 */
export const readUpload: RequestHandler = (req, res, next) =>
  parser(req, res, (error?: unknown) => {
    if (error) return next(uploadRefusal(error))
    if (!req.file)
      return next(new AppError(400, 'invalid_upload', 'Choose a file to upload', { file: 'Choose a file' }))
    next()
  })
