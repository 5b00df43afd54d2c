import { join } from 'node:path'
import type { Page } from 'playwright-core'
import { describe, expect, it } from 'vitest'
import type { HangRevision, HangSummary, Lineset } from '../../shared/schemas/index.js'
import { artifacts, demoInBrowser, signInOnPage } from '../support/demo-in-browser.js'

// Issue 8: the fly operator builds an electric from the venue's item library, saves it twice, and reads both
// revisions back in the lineset's history. Every wait is for a state on the page or an answer from the server.

const suite = demoInBrowser()
const FOURTH_ELECTRIC = 25 // demo-linesets.ts: a double-purchase electric with no hang yet

/** Picks `name` from a Vuetify select; its list opens in an overlay at the end of the page. */
async function choose(page: Page, selectTestId: string, name: string) {
  await page.locator(`[data-testid=${selectTestId}]`).click()
  await page.locator('.v-overlay--active .v-list-item', { hasText: name }).first().click()
}

/** Adds a lighting row of library units spread evenly along a stretch of the batten. */
async function addSpread(page: Page, index: number, type: string, quantity: number, from: number, to: number) {
  await page.locator('[data-testid=hang-add-lighting]').click()
  const row = (part: string) => page.locator(`[data-testid=hang-row-${index}-${part}]`)
  await row('label').waitFor()
  await choose(page, `hang-row-${index}-itemTypeId`, type)
  await row('placement-stretch').click()
  await row('quantity').locator('input').fill(String(quantity))
  await row('from').locator('input').fill(String(from))
  await row('to').locator('input').fill(String(to))
}

async function saveAndWait(page: Page, revision: number) {
  const saved = page.waitForResponse(
    (res) => res.request().method() === 'POST' && /\/api\/v1\/linesets\/[^/]+\/hangs$/.test(res.url()),
  )
  await page.locator('[data-testid=hang-save]').click()
  expect((await saved).status()).toBe(201)
  await expect.poll(() => page.locator('[data-testid=hang-revision]').innerText()).toContain(`Revision ${revision}`)
}

describe('a saved hang, from the library to the history', () => {
  it('when the fly operator builds an electric from the library and saves it, then the history shows the revisions and what changed', async () => {
    const page = await suite.newPage()
    await signInOnPage(page, suite.app.url, 'fly@demo.test')
    await page.locator(`[data-testid=linesets-row-${FOURTH_ELECTRIC}]`).click()
    await page.locator('[data-testid=hang-items-empty]').waitFor()

    await page.locator('[data-testid=hang-title] input').fill('Fourth electric, act one')
    await addSpread(page, 0, 'Ellipsoidal spotlight', 8, 4, 44)
    await addSpread(page, 1, 'LED wash', 6, 6, 42)
    await page.locator('[data-testid=balance-brick-plan]').waitFor()
    await saveAndWait(page, 1)
    await page.screenshot({ path: join(artifacts, 'fly-operator-saved-electric.png'), fullPage: true })

    // What the server kept: the entries as typed, naming the library's types, and its own result.
    const linesets = (await (await page.request.get(`${suite.app.url}/api/v1/linesets`)).json()) as Lineset[]
    const electric = linesets.find((lineset) => lineset.number === FOURTH_ELECTRIC)!
    const hangsUrl = `${suite.app.url}/api/v1/linesets/${electric.id}/hangs`
    const [first] = (await (await page.request.get(hangsUrl)).json()) as HangSummary[]
    const stored = (await (await page.request.get(`${hangsUrl}/${first!.id}`)).json()) as HangRevision
    expect(stored.revision).toBe(1)
    expect(stored.title).toBe('Fourth electric, act one')
    expect(stored.items).toMatchObject([
      { label: 'Ellipsoidal spotlight', category: 'lighting', quantity: 8, from: 4, to: 44 },
      { label: 'LED wash', category: 'lighting', quantity: 6, from: 6, to: 42 },
    ])
    expect(stored.items.every((item) => 'itemTypeId' in item)).toBe(true)

    // Two more spotlights go on, as a second revision.
    await page.locator('[data-testid=hang-row-0-quantity] input').fill('10')
    await saveAndWait(page, 2)

    await page.locator('[data-testid=lineset-history]').click()
    const timeline = page.locator('[data-testid=history-timeline]')
    await expect.poll(() => timeline.innerText()).toMatch(/revision 2/i)
    expect(await timeline.innerText()).toMatch(/revision 1/i)
    const changed = page.locator('[data-testid=comparison-changed]')
    await expect.poll(() => changed.innerText()).toContain('Ellipsoidal spotlight')
    expect(await changed.innerText()).toMatch(/quantity: 8 → 10/i)
    await expect.poll(() => page.locator('[data-testid=comparison-row-total]').innerText()).toMatch(/\+\s?37 lb/) // two more spotlights of 17 lb with 1.5 lb of clamp and safety each (demo library)
    await page.screenshot({ path: join(artifacts, 'fly-operator-hang-history.png'), fullPage: true })
    await page.close()
  })
})
