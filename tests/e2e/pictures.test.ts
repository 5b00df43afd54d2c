import { join } from 'node:path'
import type { Page } from 'playwright-core'
import { describe, expect, it } from 'vitest'
import { artifacts, demoInBrowser, signInOnPage } from '../support/demo-in-browser.js'

// Issue 11: the batten diagram follows the hang editor as someone types, and the charts draw from the same figures.
// Every wait is for a state on the page, never for a time.

const suite = demoInBrowser()
const FOURTH_ELECTRIC = 25 // demo-linesets.ts: a double-purchase electric with no hang yet, 56 ft of travel

async function choose(page: Page, selectTestId: string, name: string) {
  await page.locator(`[data-testid=${selectTestId}]`).click()
  await page.locator('.v-overlay--active .v-list-item', { hasText: name }).first().click()
}

const diagramLabel = (page: Page) =>
  page.locator('[data-testid=hang-pictures] [data-testid=batten-diagram] svg').getAttribute('aria-label')

describe('pictures of the hang', () => {
  it('when the fly operator types items into the hang editor, then the batten diagram changes with them and the charts follow', async () => {
    const page = await suite.newPage()
    await page.setViewportSize({ width: 1280, height: 900 })
    await signInOnPage(page, suite.app.url, 'fly@demo.test')
    await page.locator(`[data-testid=linesets-row-${FOURTH_ELECTRIC}]`).click()
    await page.locator('[data-testid=hang-items-empty]').waitFor()
    const diagram = page.locator('[data-testid=hang-pictures] [data-testid=batten-diagram]')
    await diagram.waitFor()
    const svg = diagram.locator('svg')
    const empty = await diagramLabel(page)
    expect(empty).toContain('49 ft batten on 6 lift lines') // demo-linesets.ts: a double-purchase batten
    expect(await diagram.locator('[data-diagram-arrow]').count()).toBe(6)
    expect(await diagram.locator('[data-testid=diagram-item-point]').count()).toBe(0)
    const svgHandle = await svg.elementHandle()

    // Eight spotlights spread from 4 ft to 44 ft: eight markers appear and every line load moves.
    await page.locator('[data-testid=hang-add-lighting]').click()
    const row = (part: string) => page.locator(`[data-testid=hang-row-0-${part}]`)
    await row('label').waitFor()
    await choose(page, 'hang-row-0-itemTypeId', 'Ellipsoidal spotlight')
    await row('placement-stretch').click()
    await row('quantity').locator('input').fill('8')
    await row('from').locator('input').fill('4')
    await row('to').locator('input').fill('44')
    await expect.poll(() => diagram.locator('[data-testid=diagram-item-point]').count()).toBe(8)
    await expect.poll(() => diagramLabel(page)).not.toBe(empty)
    const loaded = await diagramLabel(page)

    // One more typed figure: the same SVG element stays on the page, its figures change.
    await row('quantity').locator('input').fill('10')
    await expect.poll(() => diagram.locator('[data-testid=diagram-item-point]').count()).toBe(10)
    await expect.poll(() => diagramLabel(page)).not.toBe(loaded)
    expect(await svgHandle!.evaluate((node) => node.isConnected)).toBe(true)

    await diagram.screenshot({ path: join(artifacts, 'pictures-batten-diagram.png') })
    const travel = page.locator('[data-testid=travel-balance]')
    await travel.locator('canvas').waitFor()
    await expect.poll(() => travel.locator('tbody tr').count()).toBe(5)
    await travel.screenshot({ path: join(artifacts, 'pictures-travel-chart.png') })
    const lineLoads = page.locator('[data-testid=line-loads-chart]')
    await lineLoads.locator('canvas').waitFor()
    await lineLoads.screenshot({ path: join(artifacts, 'pictures-line-loads-chart.png') })

    // On paper: the labels print, dark on white, at A4 width.
    await page.emulateMedia({ media: 'print' })
    await page.setViewportSize({ width: 794, height: 1123 })
    await expect.poll(() => diagram.locator('.batten-diagram__print-label').first().isVisible()).toBe(true)
    await diagram.screenshot({ path: join(artifacts, 'pictures-batten-diagram-print-a4.png') })
    await page.emulateMedia({ media: 'screen' })
    await page.setViewportSize({ width: 1280, height: 900 })

    // Saved twice, the history draws each side from what it saved: its own items and its bending moment.
    await page.locator('[data-testid=hang-title] input').fill('Fourth electric, pictures')
    for (const [revision, quantity] of [
      [1, '10'],
      [2, '6'],
    ] as const) {
      await row('quantity').locator('input').fill(quantity)
      await page.locator('[data-testid=hang-save]').click()
      await expect.poll(() => page.locator('[data-testid=hang-revision]').innerText()).toContain(`Revision ${revision}`)
    }
    await page.locator('[data-testid=lineset-history]').click()
    await page.locator('[data-testid=comparison-right]').waitFor()
    const sides = page.locator('[data-testid=comparison-left-diagram], [data-testid=comparison-right-diagram]')
    await expect.poll(() => sides.count(), { timeout: 20_000 }).toBe(2)
    expect(await sides.first().locator('svg').getAttribute('aria-label')).toContain('49 ft batten on 6 lift lines')
    const markers = (side: string) => page.locator(`[data-testid=${side}] [data-testid=diagram-item-point]`).count()
    await expect.poll(() => markers('comparison-left-diagram')).toBe(10)
    await expect.poll(() => markers('comparison-right-diagram')).toBe(6)
    for (const side of ['comparison-left-diagram', 'comparison-right-diagram'])
      expect(await page.locator(`[data-testid=${side}] [data-testid=diagram-moment]`).count()).toBe(1)
    await sides.first().screenshot({ path: join(artifacts, 'pictures-history-diagram.png') })
    await sides.last().screenshot({ path: join(artifacts, 'pictures-history-diagram-right.png') })
  })

  it('when the stock page opens, then the stock chart stands beside its table', async () => {
    const page = await suite.newPage()
    await page.setViewportSize({ width: 1280, height: 900 })
    await signInOnPage(page, suite.app.url, 'fly@demo.test')
    await page.locator('[data-testid=linesets-row-1]').waitFor()
    await page.goto(`${suite.app.url}/bricks`)
    const stock = page.locator('[data-testid=brick-stock-chart]')
    await stock.locator('canvas').waitFor()
    expect(await stock.locator('canvas').getAttribute('aria-label')).toMatch(/Brick stock by type: .+ on arbors/)
    expect(await stock.locator('tbody tr').count()).toBeGreaterThan(0)
    await stock.screenshot({ path: join(artifacts, 'pictures-stock-chart.png') })
  })
})
