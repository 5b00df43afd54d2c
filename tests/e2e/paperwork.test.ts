import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { artifacts, demoInBrowser, signInOnPage } from '../support/demo-in-browser.js'

// Issue 12: the fly operator imports a lighting list as CSV, previews it and saves it as a revision. Every
// wait is for a state on the page or an answer from the server.

const suite = demoInBrowser()
const FOURTH_ELECTRIC = 25 // demo-linesets.ts: a double-purchase electric with no hang yet

// Invented data, as a lighting department's list might come: a BOM, CR LF, a quoted comma and a blank row.
const LIGHTING_LIST =
  '\uFEFFUnit,Fixture,Position (ft),Qty,Notes\r\n' +
  '1,Ellipsoidal spotlight,4,1,"Focus DS, centre"\r\n' +
  '2,LED wash,10,2,\r\n' +
  ',,,,\r\n' +
  '3,LED wash,20,2,\n' +
  '4,Ellipsoidal spotlight,30,1,\r\n'

describe('a hang imported from a lighting list', () => {
  it('when the fly operator imports a list, then the preview reads every row and the save makes a revision', async () => {
    const page = await suite.newPage()
    await signInOnPage(page, suite.app.url, 'fly@demo.test')
    await page.locator(`[data-testid=linesets-row-${FOURTH_ELECTRIC}]`).click()
    await page.locator('[data-testid=lineset-import-hang]').click()
    await page
      .locator('[data-testid=hang-import-file] input[type=file]')
      .setInputFiles({ name: 'fourth-electric.csv', mimeType: 'text/csv', buffer: Buffer.from(LIGHTING_LIST) })
    await page.locator('[data-testid=hang-import-preview]').waitFor()
    await expect
      .poll(() => page.locator('[data-testid=hang-import-summary]').innerText())
      .toContain('4 rows read, 0 to fix.')
    await page.screenshot({ path: join(artifacts, 'fly-operator-import-preview.png'), fullPage: true })
    const saved = page.waitForResponse(
      (res) => res.request().method() === 'POST' && /\/api\/v1\/linesets\/[^/]+\/hangs$/.test(res.url()),
    )
    await page.locator('[data-testid=hang-import-commit]').click()
    expect((await saved).status()).toBe(201)
    await expect.poll(() => page.locator('[data-testid=hang-revision]').innerText()).toContain('Revision 1')
    await page.screenshot({ path: join(artifacts, 'fly-operator-imported-hang.png'), fullPage: true })
  })
})
