import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { artifacts, demoInBrowser, signInOnPage } from '../support/demo-in-browser.js'
import { queueMessages } from '../support/outbox.js'

const suite = demoInBrowser()

/** Two made-up messages the mail server could not take, so the page shows every state. */
async function messagesThatDidNotGo() {
  const { db } = suite.app.handle.context
  const admin = await db.models.User.findOne({ where: { email: 'admin@demo.test' } })
  const membership = await db.models.Membership.findOne({ where: { userId: admin!.id } })
  const actor = {
    id: admin!.id,
    email: admin!.email,
    name: admin!.name,
    role: membership!.role,
    venueId: membership!.venueId,
  }
  const [waiting, failed] = await queueMessages(
    suite.app.handle.context,
    actor,
    [
      { to: ['dara@demo.test'], subject: 'Fly rail rota for the week', text: 'Rail calls from the half.' },
      { to: ['old.address@demo.test'], subject: 'Join the demo venue on Loftledger', text: 'An old invitation.' },
    ],
    { deliver: false },
  )
  const refused = 'The mail server did not take the message: connect ECONNREFUSED 127.0.0.1:2525'
  const tomorrow = new Date(Date.now() + 86_400_000)
  await db.models.Outbox.update(
    { attempts: 2, lastError: refused, nextAttemptAt: tomorrow },
    { where: { id: waiting! } },
  )
  await db.models.Outbox.update({ state: 'failed', attempts: 10, lastError: refused }, { where: { id: failed! } })
}

describe('the administrator reads the outgoing mail', () => {
  it('when an invitation has gone out, then the outbox page shows it sent, with its recipient and its text on opening', async () => {
    await messagesThatDidNotGo()
    const admin = await suite.newPage()
    await signInOnPage(admin, suite.app.url, 'admin@demo.test')
    await admin.locator('[data-testid=linesets-row-1]').waitFor()
    await admin.goto(`${suite.app.url}/people`)
    await admin.locator('[data-testid=people-add]').click()
    await admin.locator('[data-testid=person-email] input').fill('wren.hollis@demo.test')
    await admin.locator('[data-testid=person-name] input').fill('Wren Hollis')
    await admin.locator('[data-testid=person-save]').click()
    await admin.locator('[data-testid=person-dialog]').waitFor({ state: 'hidden' })
    await suite.app.mailbox.latestTo('wren.hollis@demo.test') // delivered: the page will read it sent

    await admin.locator('[data-testid=nav-outbox]').click()
    await expect.poll(() => admin.locator('[data-testid=page-title]').innerText()).toBe('Outgoing mail')
    const first = admin.locator('[data-testid^=outbox-message-]').first()
    await expect.poll(() => first.locator('[data-testid=outbox-recipients]').innerText()).toContain('wren.hollis')
    expect(await first.locator('[data-testid=outbox-state]').innerText()).toBe('Sent')
    await first.locator('button').first().click()
    await expect.poll(() => first.locator('[data-testid=outbox-body]').innerText()).toContain('/invitation/')
    const states = await admin.locator('[data-testid=outbox-state]').allInnerTexts()
    // The two older ones were written in one transaction, at one moment: their order between them is the id's.
    expect(states[0]).toBe('Sent')
    expect(states.slice(1).sort()).toEqual(['Not delivered, gave up', 'Waiting to be sent'])
    await admin.screenshot({ path: join(artifacts, 'administrator-outbox.png'), fullPage: true })

    await admin.setViewportSize({ width: 390, height: 844 })
    await admin.screenshot({ path: join(artifacts, 'administrator-outbox-phone.png'), fullPage: true })
    await admin.close()
  })
})
