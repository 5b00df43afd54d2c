import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { artifacts, demoInBrowser, signInOnPage } from '../support/demo-in-browser.js'

const suite = demoInBrowser()

describe('the administrator brings a new crew member in', () => {
  it('when the administrator invites someone, then the e-mailed link lets them choose a password by the rule and land signed in to the venue', async () => {
    const admin = await suite.newPage()
    await signInOnPage(admin, suite.app.url, 'admin@demo.test')
    await admin.locator('[data-testid=linesets-row-1]').waitFor()
    await admin.goto(`${suite.app.url}/people`)
    await admin.locator('[data-testid=people-add]').click()
    await admin.locator('[data-testid=person-email] input').fill('new.hand@demo.test')
    await admin.locator('[data-testid=person-name] input').fill('Rowan Ashby')
    await admin.locator('[data-testid=person-save]').click()
    await expect
      .poll(() => admin.locator('[data-testid=invitations-table]').innerText())
      .toContain('new.hand@demo.test')
    await admin.locator('[data-testid=person-dialog]').waitFor({ state: 'hidden' })
    await admin.screenshot({ path: join(artifacts, 'administrator-people-invited.png'), fullPage: true })
    await admin.close()

    // The link from the e-mail, opened in a browser where nobody is signed in.
    const token = await suite.app.mailbox.invitationTokenFor('new.hand@demo.test')
    const newcomer = await suite.newPage()
    await newcomer.goto(`${suite.app.url}/invitation/${token}`)
    await expect
      .poll(() => newcomer.locator('[data-testid=invitation-summary]').innerText())
      .toContain('new.hand@demo.test')
    await newcomer.locator('[data-testid=invitation-password] input').fill('short')
    await newcomer.locator('[data-testid=invitation-submit]').click()
    await expect
      .poll(() => newcomer.locator('[data-testid=invitation-password]').innerText())
      .toContain('At least 12 characters')
    await newcomer.screenshot({ path: join(artifacts, 'invitation-password-rule.png'), fullPage: true })
    await newcomer.locator('[data-testid=invitation-password] input').fill('a-counterweight-of-my-own')
    await newcomer.locator('[data-testid=invitation-submit]').click()
    await newcomer.locator('[data-testid=linesets-row-1]').waitFor()
    await expect.poll(() => newcomer.locator('[data-testid=app-user-role]').innerText()).toMatch(/fly operator/i)
    await newcomer.close()
  })
})
