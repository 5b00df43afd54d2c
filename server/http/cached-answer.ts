import type { Request, Response } from 'express'
import type { ServiceContext } from '../context.js'
import { chosenEncoding, encodeAnswer, type AnswerEncoding } from '../modules/answers/answer-encodings.js'
import { answerFingerprint } from '../modules/answers/answer-fingerprint.js'
import { lookUpAnswer, storeAnswer } from '../modules/answers/answer-store.js'

const log = (error: unknown) =>
  console.error('loftledger: answer cache:', error instanceof Error ? error.message : error)

// Sent already encoded: the compression middleware leaves an answer with a Content-Encoding alone.
function send(res: Response, bytes: Buffer, encoding: AnswerEncoding) {
  res.set('Content-Type', 'application/json; charset=utf-8')
  res.vary('Accept-Encoding')
  if (encoding !== 'identity') res.set('Content-Encoding', encoding)
  res.set('Content-Length', String(bytes.length))
  res.end(bytes)
}

/**
 * Answers a read that is the same for every member of the venue and changes only with the venue's data
 * (`compute`, which must not depend on who asks or on the clock), from the venue's stored copy when it is
 * still current, else computes it, stores it and sends it.
 *
 * The epoch is read BEFORE the answer is computed. A write committing while the answer is computed then
 * leaves the fresh answer stored under an epoch that is already old, so it is never served; had the epoch
 * been read after, an answer computed from the data before that write would be stored under the epoch after
 * it, and served stale until the venue's next change.
 */
export async function sendCachedAnswer(
  ctx: ServiceContext,
  req: Request,
  res: Response,
  name: string,
  compute: () => Promise<unknown>,
): Promise<void> {
  const encoding = chosenEncoding(req.get('Accept-Encoding'))
  const build = await answerFingerprint()
  const key = `${build}:${name}`
  const stored = await lookUpAnswer(ctx, key, encoding)
  if (stored.bytes) return send(res, stored.bytes, encoding)
  const answer = await encodeAnswer(await compute())
  // A failed store (the venue removed meanwhile, a lost connection) costs the next reader a computation only.
  await storeAnswer(ctx, { key, build, epoch: stored.epoch, answer }).catch(log)
  send(res, answer[encoding], encoding)
}
