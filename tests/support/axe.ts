import { readFileSync } from 'node:fs'
import { createRequire } from 'node:module'
import type { Page } from 'playwright-core'

const axeSource = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8')

/** The WCAG 2.1 rules at levels A and AA. */
export const WCAG_21_AA = ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']

export interface AxeFinding {
  rule: string
  impact: string
  help: string
  /** Where, as CSS selectors, with axe's own summary of what is wrong at the first one. */
  targets: string[]
  summary: string
}

interface AxeResults {
  violations: Array<{
    id: string
    impact: string | null
    help: string
    nodes: Array<{ target: unknown[]; failureSummary?: string }>
  }>
}

/**
 * Runs axe-core over the whole document as it is now. Its source is evaluated through the debugging protocol:
 * the app's Content-Security-Policy rightly refuses an inline script tag.
 */
export async function axeFindings(page: Page): Promise<AxeFinding[]> {
  if (!(await page.evaluate('typeof window.axe !== "undefined"'))) await page.evaluate(`${axeSource};void 0`)
  const results = (await page.evaluate(
    `window.axe.run(document, { runOnly: { type: 'tag', values: ${JSON.stringify(WCAG_21_AA)} }, resultTypes: ['violations'] })`,
  )) as AxeResults
  return results.violations.map((violation) => ({
    rule: violation.id,
    impact: violation.impact ?? 'unknown',
    help: violation.help,
    targets: violation.nodes.map((node) => node.target.map(String).join(' ')),
    summary: (violation.nodes[0]?.failureSummary ?? '').replace(/\s+/g, ' ').trim(),
  }))
}

/** One finding per paragraph, readable in a test failure. */
export function describeFindings(where: string, findings: AxeFinding[]): string[] {
  return findings.map(
    (f) =>
      `${where}: ${f.impact} ${f.rule} (${f.help}) at ${f.targets.length} place(s): ` +
      `${f.targets.slice(0, 4).join(' | ')}${f.targets.length > 4 ? ' | ...' : ''}\n    ${f.summary}`,
  )
}
