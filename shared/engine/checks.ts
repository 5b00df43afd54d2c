import type { Check, CheckLevel } from '../schemas/calculation-result.js'

export type { Check, CheckLevel }

/**
 * Builds one finding.
 *
 * @example
 * check('line-slack', 'danger', 'Lift line at 20 ft carries no load') // { code, level, message }
 */
export function check(code: string, level: CheckLevel, message: string): Check {
  return { code, level, message }
}

const ORDER: Record<CheckLevel, number> = { danger: 0, caution: 1, info: 2 }

/**
 * Puts dangers first, then cautions, then information, keeping the order within each level.
 *
 * @example
 * sortChecks([check('a', 'info', ''), check('b', 'danger', '')]).map((c) => c.code) // ['b', 'a']
 */
export function sortChecks(checks: readonly Check[]): Check[] {
  return checks
    .map((c, i) => [c, i] as const)
    .sort(([a, i], [b, j]) => ORDER[a.level] - ORDER[b.level] || i - j)
    .map(([c]) => c)
}
