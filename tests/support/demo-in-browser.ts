import { mkdirSync } from 'node:fs'
import { join } from 'node:path'
import type { BrowserContext } from 'playwright-core'
import { afterAll, beforeAll } from 'vitest'
import { seedDemoIfEmpty } from '../../server/db/seeders/demo.js'
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
  const suite = {} as { app: TestApp; context: BrowserContext }
  let chromium: Awaited<ReturnType<typeof launchChromium>> | undefined
  beforeAll(async () => {
    const clientDir = join(projectRoot, 'dist')
    await buildClientIfStale(clientDir)
    suite.app = await startTestApp({ env: { CLIENT_DIR: clientDir } })
    await seedDemoIfEmpty(suite.app.handle.db)
    chromium = await launchChromium()
    suite.context = chromium.context
    mkdirSync(artifacts, { recursive: true })
  })
  afterAll(async () => {
    await chromium?.close()
    await suite.app?.stop()
  })
  return suite
}
