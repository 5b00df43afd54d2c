import { join } from 'node:path'
import type { Page } from 'playwright-core'
import { describe, expect, it } from 'vitest'
import { DEMO_LINESETS } from '../../server/db/seeders/demo-linesets.js'
import { artifacts, demoInBrowser, signInOnPage } from '../support/demo-in-browser.js'

const suite = demoInBrowser()
const foreignRequests: string[] = []

async function signIn(page: Page, email: string) {
  page.on('request', (request) => {
    const url = new URL(request.url())
    if (!['127.0.0.1', 'localhost'].includes(url.hostname) && url.protocol.startsWith('http'))
      foreignRequests.push(request.url())
  })
  await signInOnPage(page, suite.app.url, email)
}

describe('the stage manager reads the linesets before a run', () => {
  it('when the stage manager signs in, then every lineset is listed read-only in the venue units, and nothing leaves for another host', async () => {
    const page = await suite.context.newPage()
    await signIn(page, 'sm@demo.test')
    // The stage manager lands on the board; the linesets are one step away.
    await page.locator('[data-testid=board-linesets]').waitFor()
    await page.goto(`${suite.app.url}/linesets`)
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
    await expect
      .poll(async () => (await page.locator('[data-testid^=linesets-row-]').allInnerTexts()).length)
      .toBe(DEMO_LINESETS.filter((l) => /electric/i.test(l.name)).length)
    expect(foreignRequests).toEqual([])
    await page.close()
  })
})
