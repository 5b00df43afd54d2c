import { QueryTypes } from 'sequelize'
import type { TransactionContext } from '../../context.js'
import { AppError } from '../../http/errors.js'

/** The latest revision of a lineset's hang, or null before its first. */
export async function latestRevision(tx: TransactionContext, linesetId: string): Promise<number | null> {
  const latest = await tx.db.models.Hang.findOne({
    where: { linesetId, venueId: tx.actor.venueId },
    attributes: ['revision'],
    order: [['revision', 'DESC']],
    transaction: tx.transaction,
  })
  return latest?.revision ?? null
}

export const staleRevision = (latest: number | null) =>
  new AppError(
    409,
    'stale_revision',
    latest === null
      ? 'This lineset has no saved hang yet; save it as the first revision'
      : `Revision ${latest} was saved since you started; compare with it and save again`,
    { basedOnRevision: latest === null ? 'No revision yet' : `The latest is revision ${latest}` },
  )

export interface NewRevision {
  venueId: string
  linesetId: string
  revision: number
  basedOnRevision: number | null
  productionId: string | null
  title: string
  createdBy: string
  unitSystem: string
  calculationInput: unknown
  calculationResult: unknown
  /** kg, SI decimal string. */
  totalLoad: string
  createdAt: Date
}

const isUniqueViolation = (error: unknown) => (error as { name?: string })?.name === 'SequelizeUniqueConstraintError'

/**
 * Writes revision `revision` only while no revision at or beyond it exists, so of saves racing on one base
 * exactly one lands (the unique key on (lineset_id, revision) backs this up); the rest answer 409.
 */
export async function insertRevision(tx: TransactionContext, row: NewRevision): Promise<{ id: string }> {
  const sql = `
    INSERT INTO hangs (venue_id, lineset_id, revision, based_on_revision, production_id, title, created_by,
      unit_system, calculation_input, calculation_result, total_load, created_at, updated_at)
    SELECT $1, $2, $3, $4, $5, $6, $7, $8, $9::jsonb, $10::jsonb, $11, $12, $12
    WHERE NOT EXISTS (SELECT 1 FROM hangs WHERE lineset_id = $2 AND revision >= $3)
    RETURNING id`
  const bind = [
    row.venueId,
    row.linesetId,
    row.revision,
    row.basedOnRevision,
    row.productionId,
    row.title,
    row.createdBy,
    row.unitSystem,
    JSON.stringify(row.calculationInput),
    JSON.stringify(row.calculationResult),
    row.totalLoad,
    row.createdAt,
  ]
  try {
    // A savepoint, so a refusal by the unique key leaves the transaction usable for the answer.
    const written = await tx.db.sequelize.transaction({ transaction: tx.transaction }, (savepoint) =>
      tx.db.sequelize.query<{ id: string }>(sql, { bind, type: QueryTypes.SELECT, transaction: savepoint }),
    )
    if (written.length === 1) return written[0]!
  } catch (error) {
    if (!isUniqueViolation(error)) throw error
  }
  throw staleRevision(await latestRevision(tx, row.linesetId))
}
