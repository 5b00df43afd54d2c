/** Which two revisions to compare, as read from the page's query (`?left=&right=`), with any it could not find. */
export interface RevisionChoice {
  left: number | null
  right: number | null
  /** Revisions the query named that this lineset does not have (the defaults stand in for them). */
  missing: number[]
}

const asRevision = (value: unknown) => {
  const text = Array.isArray(value) ? value[0] : value
  return typeof text === 'string' && /^[1-9]\d{0,8}$/.test(text) ? Number(text) : null
}

/**
 * The two revisions to compare: those the query names when the lineset has them, else the latest on the right
 * and the one before the right on the left. With a single revision there is nothing to compare it with (left is null).
 *
 * @example
 * chooseRevisions([3, 2, 1], {}) // { left: 2, right: 3, missing: [] }
 * chooseRevisions([3, 2, 1], { left: '1', right: '9' }) // { left: 1, right: 3, missing: [9] }
 */
export function chooseRevisions(newestFirst: readonly number[], query: { left?: unknown; right?: unknown }) {
  const missing: number[] = []
  const known = (value: unknown) => {
    const revision = asRevision(value)
    if (revision === null) return null
    if (newestFirst.includes(revision)) return revision
    missing.push(revision)
    return null
  }
  const askedLeft = known(query.left)
  const right = known(query.right) ?? newestFirst[0] ?? null
  const before = newestFirst.find((revision) => right !== null && revision < right)
  const left = askedLeft ?? before ?? newestFirst.find((revision) => revision !== right) ?? null
  return { left, right, missing } satisfies RevisionChoice
}
