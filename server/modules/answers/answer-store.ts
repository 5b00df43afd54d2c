import { QueryTypes } from 'sequelize'
import type { ServiceContext } from '../../context.js'
import type { AnswerEncoding, EncodedAnswer } from './answer-encodings.js'

/** A venue's stored answer as one encoding, if still current, and the epoch it was looked up under. */
export interface StoredLookup {
  /** The venue's epoch when looked up: a fresh answer computed after this read is stored under it. */
  epoch: string
  /** The stored answer's bytes in the asked encoding; null when none is stored under the current epoch. */
  bytes: Buffer | null
}

const CURRENT_EPOCH = `coalesce((SELECT epoch FROM answer_epochs WHERE venue_id = $1), '0'::xid8)`

// One statement, so the epoch and the entry are of one moment. Only the asked encoding travels.
const LOOKUP = `
  SELECT e.epoch::text AS epoch,
         CASE $3 WHEN 'br' THEN c.brotli WHEN 'gzip' THEN c.gzip ELSE c.body END AS bytes
    FROM (SELECT ${CURRENT_EPOCH} AS epoch) e
    LEFT JOIN answer_cache c ON c.venue_id = $1 AND c.key = $2 AND c.epoch = e.epoch`

/** Looks up the venue's answer under `key` in one encoding (see `StoredLookup`). */
export async function lookUpAnswer(ctx: ServiceContext, key: string, encoding: AnswerEncoding): Promise<StoredLookup> {
  const [found] = await ctx.db.sequelize.query<StoredLookup>(LOOKUP, {
    bind: [ctx.actor.venueId, key, encoding],
    type: QueryTypes.SELECT,
  })
  return found!
}

// Of two readers storing at once, the entry already under the venue's current epoch stays: an entry under any
// other epoch is never served, so replacing one costs nothing and keeping a current one saves the next reader's
// work. (Comparing epochs by size would not say which is newer: transaction ids are handed out in start order,
// epochs are set in commit order.) Entries of another build of the code are cleared on the way: never served.
const STORE = `
  WITH other_builds AS (DELETE FROM answer_cache WHERE venue_id = $1 AND split_part(key, ':', 1) <> $7)
  INSERT INTO answer_cache AS c (venue_id, key, epoch, body, brotli, gzip) VALUES ($1, $2, $3::xid8, $4, $5, $6)
  ON CONFLICT (venue_id, key) DO UPDATE
    SET epoch = EXCLUDED.epoch, body = EXCLUDED.body, brotli = EXCLUDED.brotli, gzip = EXCLUDED.gzip
    WHERE c.epoch <> ${CURRENT_EPOCH}`

/** Stores the venue's answer under `key` (which starts with `build` and a colon) for `epoch`. */
export async function storeAnswer(
  ctx: ServiceContext,
  entry: { key: string; build: string; epoch: string; answer: EncodedAnswer },
): Promise<void> {
  const { key, build, epoch, answer } = entry
  await ctx.db.sequelize.query(STORE, {
    bind: [ctx.actor.venueId, key, epoch, answer.identity, answer.br, answer.gzip, build],
    type: QueryTypes.INSERT,
  })
}
