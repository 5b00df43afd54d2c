import { mkdirSync } from 'node:fs'
import { join } from 'node:path'
import type { BrowserContext, Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { seedDemoIfEmpty } from '../../server/db/seeders/demo.js'
import { DEMO_LINESETS } from '../../server/db/seeders/demo-linesets.js'
import { DEMO_PASSWORD } from '../../server/db/seeders/demo-people.js'
import { buildClientIfStale } from '../../scripts/lib/client-build.js'
import { projectRoot } from '../../scripts/lib/paths.js'
import { launchChromium } from '../support/browser.js'
import { startTestApp, type TestApp } from '../support/test-app.js'

const artifacts = join(projectRoot, 'tests', 'artifacts')
let app: TestApp
let chromium: Awaited<ReturnType<typeof launchChromium>>
let browser: BrowserContext
const foreignRequests: string[] = []

beforeAll(async () => {
  const clientDir = join(projectRoot, 'dist')
  await buildClientIfStale(clientDir)
  app = await startTestApp({ env: { CLIENT_DIR: clientDir } })
  await seedDemoIfEmpty(app.handle.db)
  chromium = await launchChromium()
  browser = chromium.context
  mkdirSync(artifacts, { recursive: true })
})
afterAll(async () => {
  await chromium?.close()
  await app?.stop()
})

async function signIn(page: Page, email: string) {
  page.on('request', (request) => {
    const url = new URL(request.url())
    if (!['127.0.0.1', 'localhost'].includes(url.hostname) && url.protocol.startsWith('http')) foreignRequests.push(request.url())
  })
  await page.goto(app.url)
  await page.locator('[data-testid=sign-in-email] input').fill(email)
  await page.locator('[data-testid=sign-in-password] input').fill(DEMO_PASSWORD)
  await page.locator('[data-testid=sign-in-submit]').click()
}

describe('the stage manager reads the linesets before a run', () => {
  it('when the stage manager signs in, then every lineset is listed read-only in the venue units, and nothing leaves for another host', async () => {
    const page = await browser.newPage()
    await signIn(page, 'sm@demo.test')
    const table = page.locator('[data-testid=linesets-table]')
    await table.waitFor()
    await page.locator('[data-testid=linesets-row-1]').waitFor()
    await expect.poll(() => page.locator('[data-testid=app-user-role]').innerText()).toMatch(/stage manager/i)

    const text = await table.innerText()
    expect(text).toContain('Main valance')
    expect(text).toMatch(/48\s*ft/)
    expect(await page.locator('[data-testid=linesets-add]').count()).toBe(0)
    await page.screenshot({ path: join(artifacts, 'stage-manager-linesets.png'), fullPage: true })

    // The filter narrows the table to what the stage manager types.
    await page.locator('[data-testid=linesets-filter] input').fill('electric')
    await expect.poll(async () => (await page.locator('[data-testid^=linesets-row-]').allInnerTexts()).length).toBe(
      DEMO_LINESETS.filter((l) => /electric/i.test(l.name)).length,
    )
    expect(foreignRequests).toEqual([])
    await page.close()
  })
})
