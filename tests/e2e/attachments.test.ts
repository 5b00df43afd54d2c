import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { artifacts, demoInBrowser, signInOnPage } from '../support/demo-in-browser.js'
import { sampleImage, sampleHtml } from '../support/upload-files.js'

const suite = demoInBrowser()

describe('attaching a photo to a lineset', () => {
  it('when the fly operator attaches a photo, then it shows with its thumbnail; a renamed web page is refused in words; the stage manager only reads', async () => {
    const page = await suite.newPage()
    await signInOnPage(page, suite.app.url, 'fly@demo.test')
    await page.locator('[data-testid=linesets-row-3]').click()
    const panel = page.locator('[data-testid=attachments-panel]')
    await panel.locator('[data-testid=attachments-none]').waitFor()

    const photo = await sampleImage('jpeg', 1200, 900)
    await panel
      .locator('[data-testid=attachments-file]')
      .setInputFiles({ name: 'Arbor after loading.jpg', mimeType: 'image/jpeg', buffer: photo })
    const row = panel.locator('[data-testid^=attachment-]').filter({ hasText: 'Arbor after loading.jpg' })
    await row.waitFor()
    expect(await row.innerText()).toMatch(/JPEG photo · \d+(\.\d)? KB · Dara Okonkwo/)
    await row.scrollIntoViewIfNeeded()
    // The thumbnail loaded: the browser decoded the image the server made.
    await expect
      // The node project has no DOM types: the page's image is read by the two properties wanted.
      .poll(() =>
        row.locator('img').evaluate((img) => {
          const image = img as unknown as { complete: boolean; naturalWidth: number }
          return image.complete && image.naturalWidth
        }),
      )
      .toBe(320)

    await panel
      .locator('[data-testid=attachments-file]')
      .setInputFiles({ name: 'rail card.png', mimeType: 'image/png', buffer: sampleHtml })
    const refusal = panel.locator('[data-testid=attachments-upload-error]')
    await refusal.waitFor()
    expect(await refusal.innerText()).toContain('“rail card.png” is not a PNG image inside')
    await panel.scrollIntoViewIfNeeded()
    await page.screenshot({ path: join(artifacts, 'attachments-fly-operator.png'), fullPage: true })
    await page.close()

    const reader = await suite.newPage()
    await signInOnPage(reader, suite.app.url, 'sm@demo.test')
    // The stage manager lands on the board; the lineset is reached from the list.
    await reader.locator('[data-testid=board-linesets]').waitFor()
    await reader.goto(`${suite.app.url}/linesets`)
    await reader.locator('[data-testid=linesets-row-3]').click()
    const readOnly = reader.locator('[data-testid=attachments-panel]')
    await readOnly.locator('[data-testid^=attachment-download-]').first().waitFor()
    expect(await readOnly.locator('[data-testid=attachments-upload]').count()).toBe(0)
    expect(await readOnly.locator('[data-testid^=attachment-delete-]').count()).toBe(0)
    await reader.close()
  })
})
