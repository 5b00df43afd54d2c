import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { DEMO_PASSWORD } from '../../server/db/seeders/demo-people.js'
import { artifacts, demoInBrowser, signInOnPage } from '../support/demo-in-browser.js'
import { signedIn } from '../support/test-app.js'

const suite = demoInBrowser()

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
    await page.setViewportSize({ width: 390, height: 844 })
    await card.scrollIntoViewIfNeeded()
    await page.screenshot({ path: join(artifacts, 'board-phone.png') })

    await director.delete(`/api/v1/linesets/${target.id}/lockout`).expect(204)
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
})
