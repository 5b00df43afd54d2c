import { promisify } from 'node:util'
import { brotliCompress, constants, gzip } from 'node:zlib'

/** The encodings an answer is stored in. */
export type AnswerEncoding = 'br' | 'gzip' | 'identity'

/** One answer as JSON bytes (utf-8) and compressed both ways. */
export type EncodedAnswer = Record<AnswerEncoding, Buffer>

const brotliAsync = promisify(brotliCompress)
const gzipAsync = promisify(gzip)

// An answer is compressed once per change of its venue's data and then served many times, so a stronger
// setting than the per-answer one (quality 1) pays: quality 5 costs a few ms on a 70 KB list (measured when
// it was chosen) for an answer about a fifth smaller.
const BROTLI_STORED = { params: { [constants.BROTLI_PARAM_QUALITY]: 5 } }

/** Serialises an answer once and compresses it once each way (on the thread pool, both at once). */
export async function encodeAnswer(answer: unknown): Promise<EncodedAnswer> {
  const identity = Buffer.from(JSON.stringify(answer), 'utf8')
  const [br, gz] = await Promise.all([brotliAsync(identity, BROTLI_STORED), gzipAsync(identity)])
  return { identity, br, gzip: gz }
}
