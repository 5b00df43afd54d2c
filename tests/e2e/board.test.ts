import { join } from 'node:path'
import type { Page, Route } from 'playwright-core'
import { describe, expect, it } from 'vitest'
import { OPERATING_STATUSES } from '../../shared/schemas/operating-status.js'
import type { Board } from '../../shared/schemas/index.js'
import { DEMO_PASSWORD } from '../../server/db/seeders/demo-people.js'
import { artifacts, demoInBrowser, signInOnPage } from '../support/demo-in-browser.js'
import { signedIn } from '../support/test-app.js'

const suite = demoInBrowser()

/** Answers the board's read with its first sets given one operating status each. */
async function everyStatusOnBoard(route: Route) {
  const response = await route.fetch()
  const board = (await response.json()) as Board
  board.linesets.forEach((lineset, i) => {
    lineset.operatingStatus = OPERATING_STATUSES[i % OPERATING_STATUSES.length]!
  })
  await route.fulfill({ response, json: board })
}

/** The words of every status chip on the board whose content is wider or taller than the chip shows. */
async function clippedStatusChips(page: Page): Promise<string[]> {
  return page
    .locator('[data-testid=board-linesets] [data-testid^=operating-]')
    .evaluateAll((chips) =>
      chips
        .filter((chip) => chip.scrollWidth > chip.clientWidth || chip.scrollHeight > chip.clientHeight)
        .map((chip) => chip.textContent?.trim() ?? ''),
    )
}

describe('the stage manager watches the board before a run', () => {
  it('when the technical director locks a set out through the API, then the stage manager open board shows it within 2 seconds', async () => {
    const page = await suite.newPage()
    await page.setViewportSize({ width: 1440, height: 1000 })
    await signInOnPage(page, suite.app.url, 'sm@demo.test')
    // The board is the stage manager's home.
    await page.locator('[data-testid=board-linesets]').waitFor()
    expect(new URL(page.url()).pathname).toBe('/board')
    await page.locator('[data-testid=board-live]').waitFor()

    const director = await signedIn(suite.app.url, 'td@demo.test', DEMO_PASSWORD)
    const linesets = (await director.get('/api/v1/linesets').expect(200)).body as {
      id: string
      number: number
      operatingStatus: string
    }[]
    const target = linesets.find((lineset) => lineset.operatingStatus !== 'locked-out')!
    const card = page.locator(`[data-testid=board-lineset-${target.number}]`)
    await card.waitFor()

    await director.post(`/api/v1/linesets/${target.id}/lockout`, { reason: 'Rope lock will not hold' }).expect(201)
    // The contract: the change is on the open board within 2 seconds (a state waited for).
    await page
      .locator(`[data-testid=board-lineset-${target.number}][data-status=locked-out]`)
      .waitFor({ timeout: 2000 })
    expect(await card.innerText()).toContain('Rope lock will not hold')
    expect(await card.innerText()).toMatch(/Locked out, just now, by Theo Lindqvist/)

    await page.screenshot({ path: join(artifacts, 'board-desktop.png') })
    expect(await clippedStatusChips(page)).toEqual([])
    await page.setViewportSize({ width: 390, height: 844 })
    await card.scrollIntoViewIfNeeded()
    await page.screenshot({ path: join(artifacts, 'board-phone.png') })
    // A safety status reads in full at phone width: no chip's words run past its box.
    expect(await clippedStatusChips(page)).toEqual([])

    await director
      .delete(`/api/v1/linesets/${target.id}/lockout`, { reason: 'Rope lock adjusted and tested' })
      .expect(204)
    await page.close()
  })

  it('when the stage manager records a pre-run check, then the board shows who checked and how many were ready', async () => {
    const page = await suite.newPage()
    await page.setViewportSize({ width: 1280, height: 900 })
    await signInOnPage(page, suite.app.url, 'sm@demo.test')
    await page.locator('[data-testid=board-linesets]').waitFor()
    await page.locator('[data-testid=board-check-record]').click()
    await page.locator('[data-testid=board-check-note-field] textarea').fill('Half hour call')
    await page.locator('[data-testid=board-check-save]').click()
    const summary = page.locator('[data-testid=board-check-summary]')
    await summary.waitFor()
    expect(await summary.innerText()).toMatch(/\d+ of \d+ ready, checked by Priya Castellano/)
    await page.screenshot({ path: join(artifacts, 'board-pre-run-check.png') })
    await page.close()
  })

  it('when every operating status is on the board, then each chip reads in full at phone and desktop widths', async () => {
    const page = await suite.newPage()
    // The demo's sets are mostly ready: the board's own answer is given one set in each status, so the longest
    // words ("Out of balance, do not operate") are measured on real cards with the built styles.
    await page.route(/\/api\/v1\/board(\?.*)?$/, (route) => everyStatusOnBoard(route))
    await page.setViewportSize({ width: 390, height: 844 })
    await signInOnPage(page, suite.app.url, 'sm@demo.test')
    const unbalanced = page.locator('[data-testid=board-linesets] [data-testid=operating-out-of-balance]').first()
    await unbalanced.waitFor()
    expect(await unbalanced.innerText()).toBe('Out of balance, do not operate')
    expect(await clippedStatusChips(page)).toEqual([])
    await unbalanced.scrollIntoViewIfNeeded()
    await page.screenshot({ path: join(artifacts, 'board-phone-every-status.png') })
    await page.setViewportSize({ width: 1440, height: 1000 })
    expect(await clippedStatusChips(page)).toEqual([])
    await page.screenshot({ path: join(artifacts, 'board-desktop-every-status.png') })
    await page.close()
  })
})
