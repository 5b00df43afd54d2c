import { mkdirSync } from 'node:fs'
import { join } from 'node:path'
import type { BrowserContext, Page } from 'playwright-core'
import { afterAll, beforeAll } from 'vitest'
import { seedDemoIfEmpty } from '../../server/db/seeders/demo.js'
import { DEMO_PASSWORD } from '../../server/db/seeders/demo-people.js'
import { buildClientIfStale } from '../../scripts/lib/client-build.js'
import { projectRoot } from '../../scripts/lib/paths.js'
import { launchChromium } from './browser.js'
import { startTestApp, type TestApp } from './test-app.js'

export const artifacts = join(projectRoot, 'tests', 'artifacts')

/**
 * For a browser test file: the built client served by the real server on a database of its own with the
 * demo venue, and Debian's Chromium. Read `app` and `context` inside tests (they exist after beforeAll).
 */
export function demoInBrowser() {
  const suite = {} as {
    app: TestApp
    context: BrowserContext
    /** A page in a browser context of its own: a person signed in there shares nothing with anyone else. */
    newPage(): Promise<Page>
  }
  let chromium: Awaited<ReturnType<typeof launchChromium>> | undefined
  beforeAll(async () => {
    const clientDir = join(projectRoot, 'dist')
    await buildClientIfStale(clientDir)
    suite.app = await startTestApp({ env: { CLIENT_DIR: clientDir } })
    await seedDemoIfEmpty(suite.app.handle.context)
    chromium = await launchChromium()
    suite.context = chromium.context
    const launched = chromium
    suite.newPage = async () => (await launched.newContext()).newPage()
    mkdirSync(artifacts, { recursive: true })
  })
  afterAll(async () => {
    await chromium?.close()
    await suite.app?.stop()
  })
  return suite
}

/**
 * Opens the app on `page` and signs in as a demo person. It waits until the sign-in page says it is ready
 * (its one-time focus is done), so nothing can move the caret while the fields are typed.
 */
export async function signInOnPage(page: Page, url: string, email: string, password = DEMO_PASSWORD) {
  await page.goto(url)
  await page.locator('[data-testid=sign-in-form][data-ready=true]').waitFor()
  await page.locator('[data-testid=sign-in-email] input').fill(email)
  await page.locator('[data-testid=sign-in-password] input').fill(password)
  await page.locator('[data-testid=sign-in-submit]').click()
}
