import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { DEMO_PASSWORD } from '../../server/db/seeders/demo-people.js'
import { artifacts, demoInBrowser, signInOnPage } from '../support/demo-in-browser.js'
import { signedIn } from '../support/test-app.js'

const suite = demoInBrowser()

/** The part of the browser's Web Animations API the test reads (the Node typings carry no DOM animations). */
interface Animated {
  getAnimations(options: { subtree: boolean }): {
    effect: { getComputedTiming(): { endTime?: number | string } } | null
    finished: Promise<unknown>
  }[]
}

describe('the technical director locks a set out and releases it', () => {
  it('when the lock-out is released, then the page asks to confirm with what was checked, and the history keeps both reasons', async () => {
    const director = await signedIn(suite.app.url, 'td@demo.test', DEMO_PASSWORD)
    const linesets = (await director.get('/api/v1/linesets').expect(200)).body as {
      id: string
      operatingStatus: string
    }[]
    const target = linesets.find((lineset) => lineset.operatingStatus === 'ready')!

    const page = await suite.newPage()
    await page.setViewportSize({ width: 390, height: 844 })
    await signInOnPage(page, suite.app.url, 'td@demo.test')
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'))
    await page.goto(`${suite.app.url}/linesets/${target.id}`)
    await page.locator('[data-testid=lockout-reason] input').fill('Head block bearing noisy')
    await page.locator('[data-testid=lockout-lock]').click()
    await page.locator('[data-testid=lockout-current]').waitFor()

    await page.locator('[data-testid=lockout-release]').click()
    const dialog = page.locator('[data-testid=lockout-release-dialog]')
    await dialog.waitFor()
    expect(await dialog.innerText()).toContain('Head block bearing noisy')
    // Confirming with nothing said is refused by the server, in words under the field; the set stays locked out.
    await page.locator('[data-testid=lockout-release-confirm]').click()
    await expect
      .poll(() => page.locator('[data-testid=lockout-release-reason] .v-messages').innerText())
      .toBe('What was checked or fixed must not be empty')
    const field = page.locator('[data-testid=lockout-release-reason]')
    await field.locator('input').fill('Bearing replaced, ran the set twice')
    // Typing clears the refusal; the label has finished moving above the text before the picture.
    await expect
      .poll(() => field.locator('.v-messages').innerText())
      .toBe("Kept in the lineset's history with the lock-out")
    await field.evaluate((element) =>
      Promise.all(
        (element as unknown as Animated)
          .getAnimations({ subtree: true })
          .filter((animation) => animation.effect?.getComputedTiming().endTime !== Infinity)
          .map((animation) => animation.finished),
      ),
    )
    await page.screenshot({ path: join(artifacts, 'lockout-release-phone.png') })
    await page.locator('[data-testid=lockout-release-confirm]').click()
    await page.locator('[data-testid=lockout-none]').waitFor()

    const events = (await director.get(`/api/v1/linesets/${target.id}/events`).expect(200)).body.events as {
      summary: string
    }[]
    expect(events[0]!.summary).toBe(
      'Lock-out released: Bearing replaced, ran the set twice (it was: Head block bearing noisy)',
    )
    await page.close()
  })
})
