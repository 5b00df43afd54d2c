import { join } from 'node:path'
import type { Page } from 'playwright-core'
import { describe, expect, it } from 'vitest'
import { DEMO_PASSWORD } from '../../server/db/seeders/demo-people.js'
import { axeFindings, describeFindings } from '../support/axe.js'
import { artifacts, demoInBrowser } from '../support/demo-in-browser.js'

const suite = demoInBrowser()
const PLAIN_FORM = '[data-testid=sign-in-form][data-early][data-ready=true]'
const APP_FORM = '[data-testid=sign-in-form][data-ready=true]:not([data-early])'

/**
 * Opens /sign-in with the app's script held back (a slow phone on a loading gallery), so only the plain form in
 * index.html is there. Calling the returned function lets the script through.
 */
async function openWithAppHeld(page: Page) {
  let release = () => {}
  const released = new Promise<void>((resolve) => (release = resolve))
  await page.route(/\/assets\/index-[^/]+\.js$/, async (route) => {
    await released
    await route.continue()
  })
  // Not waiting for the page's load: the held script is one of the things that event waits for.
  await page.goto(`${suite.app.url}/sign-in`, { waitUntil: 'commit' })
  await page.locator(PLAIN_FORM).waitFor()
  return release
}

describe('the plain sign-in form, before the app has loaded', () => {
  it('when the app is still loading, then the plain form is there, readable by everyone and reached by keyboard', async () => {
    const page = await suite.newPage()
    for (const size of [
      { width: 390, height: 844 },
      { width: 1440, height: 900 },
    ]) {
      await page.setViewportSize(size)
      const release = await openWithAppHeld(page)
      const found = describeFindings(`plain sign-in form at ${size.width}px`, await axeFindings(page))
      expect(found, found.join('\n')).toEqual([])
      expect(await page.evaluate('document.activeElement?.id')).toBe('early-sign-in-email')
      await page.screenshot({ path: join(artifacts, `sign-in-plain-form-${size.width}.png`) })
      release()
      await page.locator(APP_FORM).waitFor()
      await page.unroute(/\/assets\/index-[^/]+\.js$/)
    }
    await page.context().close()
  })

  it('when someone types and presses Enter before the app has loaded, then it signs them in once it arrives', async () => {
    const page = await suite.newPage()
    const release = await openWithAppHeld(page)
    await page.keyboard.type('fly@demo.test')
    await page.keyboard.press('Tab')
    await page.keyboard.type(DEMO_PASSWORD)
    await page.keyboard.press('Enter')
    await expect
      .poll(() => page.locator('#early-sign-in [role=status]').textContent())
      .toBe('Signing in as soon as the page has loaded…')
    expect(page.url()).toBe(`${suite.app.url}/sign-in`)

    release()
    await page.locator('[data-testid^=linesets-row-]').first().waitFor()
    expect(new URL(page.url()).pathname).toBe('/linesets')
    expect(await page.locator('#early-sign-in').count()).toBe(0)
    await page.context().close()
  })

  it('when a signed-in person opens /sign-in, then the plain form gives way to their home page', async () => {
    const page = await suite.newPage()
    const release = await openWithAppHeld(page)
    await page.keyboard.type('sm@demo.test')
    await page.keyboard.press('Tab')
    await page.keyboard.type(DEMO_PASSWORD)
    release()
    await page.locator(APP_FORM).waitFor()
    await page.locator('[data-testid=sign-in-submit]').click()
    await page.waitForURL(/\/board$/)
    await page.goto(`${suite.app.url}/sign-in`)
    await page.waitForURL(/\/board$/)
    await expect.poll(() => page.locator('#early-sign-in').count()).toBe(0)
    await page.context().close()
  })
})
