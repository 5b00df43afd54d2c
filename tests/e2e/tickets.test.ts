import { join } from 'node:path'
import type { Page } from 'playwright-core'
import { describe, expect, it } from 'vitest'
import type { BrickStockLine } from '../../shared/schemas/arbor.js'
import { DEMO_PASSWORD } from '../../server/db/seeders/demo-people.js'
import { artifacts, demoInBrowser, signInOnPage } from '../support/demo-in-browser.js'
import { signedIn } from '../support/test-app.js'

const suite = demoInBrowser()

async function pageFor(email: string, path = '/'): Promise<Page> {
  const page = await suite.newPage()
  await page.setViewportSize({ width: 1280, height: 900 })
  await signInOnPage(page, `${suite.app.url}${path}`, email)
  return page
}

const shot = (page: Page, name: string) => page.screenshot({ path: join(artifacts, `${name}.png`), fullPage: true })

describe('a weight change from asking to loaded', () => {
  it('when the fly operator asks, the director approves from the e-mail link and the crew loads, then the arbor and the stock follow', async () => {
    // The fly operator saves a heavier hang on a hung, ready counterweight set (an invented painted drop).
    const api = await signedIn(suite.app.url, 'fly@demo.test', DEMO_PASSWORD)
    const sets = (await api.get('/api/v1/linesets').expect(200)).body as {
      id: string
      number: number
      kind: string
      operatingStatus: string
      battenLength: number
    }[]
    const set = sets.find((s) => s.kind === 'counterweight-single' && s.operatingStatus === 'ready')!
    const hangs = (await api.get(`/api/v1/linesets/${set.id}/hangs`).expect(200)).body as { revision: number }[]
    await api
      .post(`/api/v1/linesets/${set.id}/hangs`, {
        title: 'Act two: painted drop',
        basedOnRevision: hangs[0]?.revision ?? null,
        items: [{ label: 'Painted drop', category: 'scenery', weight: 180, at: set.battenLength / 2 }],
        unitSystem: 'imperial',
      })
      .expect(201)
    const stockBefore = (await api.get('/api/v1/brick-stock').expect(200)).body as BrickStockLine[]

    const operator = await pageFor('fly@demo.test', `/linesets/${set.id}`)
    await operator.locator('[data-testid=lineset-ask-change]').click()
    await operator.locator('[data-testid=ticket-plan]').waitFor()
    expect(await operator.locator('[data-testid=ticket-decision]').count()).toBe(0) // nobody decides their own
    await shot(operator, 'fly-operator-ticket-asked')
    const ticketId = operator.url().split('/tickets/')[1]!

    const mail = await suite.app.mailbox.latestTo('td@demo.test')
    const link = /\/tickets\/[0-9a-f-]+/.exec(mail.text)![0]
    expect(link).toBe(`/tickets/${ticketId}`)
    const director = await pageFor('td@demo.test', link)
    await director.locator('[data-testid=ticket-decision]').waitFor()
    await shot(director, 'technical-director-ticket-deciding')
    await director.locator('[data-testid=ticket-comment] textarea').fill('Load it before the half')
    await director.locator('[data-testid=ticket-approve]').click()
    await director.locator('[data-testid=ticket-state-approved]').waitFor()
    await shot(director, 'technical-director-ticket-approved')
    expect((await suite.app.mailbox.latestTo('fly@demo.test')).text).toContain(link)
    await director.close()

    // The fly operator opens the e-mailed link in a fresh browser for the loading.
    await operator.close()
    const loader = await pageFor('fly@demo.test', link)
    await loader.locator('[data-testid=ticket-start-loading]').click()
    await loader.locator('[data-testid=ticket-checklist]').waitFor()
    const ticks = loader.locator('[data-testid^=ticket-step-tick-] input')
    await shot(loader, 'fly-operator-loading-checklist')
    for (let n = 0; n < (await ticks.count()); n++) await ticks.nth(n).check()
    await loader.locator('[data-testid=ticket-complete]').waitFor()
    await loader.locator('[data-testid=ticket-felt-balanced] input').check()
    await shot(loader, 'fly-operator-loading-complete-form')
    await loader.setViewportSize({ width: 390, height: 844 })
    await shot(loader, 'fly-operator-loading-phone')
    // The arbor's step: bricks off, bricks on, or both, as the plan for this hang has it.
    await loader
      .locator('[data-testid=ticket-step-arbor-off], [data-testid=ticket-step-arbor-on]')
      .first()
      .scrollIntoViewIfNeeded()
    await loader.screenshot({ path: join(artifacts, 'fly-operator-loading-phone-step.png') })
    await loader.locator('[data-testid=ticket-complete]').scrollIntoViewIfNeeded()
    await loader.screenshot({ path: join(artifacts, 'fly-operator-loading-phone-form.png') })
    await loader.setViewportSize({ width: 1280, height: 900 })
    await loader.locator('[data-testid=ticket-finish]').click()
    await loader.locator('[data-testid=ticket-state-loaded]').waitFor()
    await shot(loader, 'fly-operator-ticket-loaded')

    const ticket = (await api.get(`/api/v1/tickets/${ticketId}`).expect(200)).body
    const arbor = (await api.get(`/api/v1/linesets/${set.id}/arbor`).expect(200)).body
    for (const after of ticket.arborAfter as { brickTypeId: string; count: number }[])
      expect(arbor.bricks.find((b: { brickTypeId: string }) => b.brickTypeId === after.brickTypeId)?.count ?? 0).toBe(
        after.count,
      )
    const stockAfter = (await api.get('/api/v1/brick-stock').expect(200)).body as BrickStockLine[]
    for (const change of ticket.changes as { brickTypeId: string; count: number }[]) {
      const was = stockBefore.find((line) => line.brickTypeId === change.brickTypeId)!
      const now = stockAfter.find((line) => line.brickTypeId === change.brickTypeId)!
      expect(now.onArbors - was.onArbors).toBe(change.count)
      expect(now.owned).toBe(now.onArbors + now.reserved + now.inStorage)
    }
    // The stock page shows the same: this arbor's count of each brick type it now holds.
    await loader.goto(`${suite.app.url}/bricks`)
    const chips = loader.locator(`[data-testid=brick-stock-place-${set.number}]`)
    await chips.first().waitFor()
    const shown = (await chips.allInnerTexts()).join(' | ')
    for (const after of ticket.arborAfter as { count: number }[])
      if (after.count > 0)
        expect(shown).toMatch(new RegExp(`${set.number} · [^|]*: ${after.count.toLocaleString('en-US')}`))
    await shot(loader, 'fly-operator-stock-after-loading')
    await loader.goto(`${suite.app.url}/tickets`)
    await loader.locator(`[data-testid=ticket-row-${ticketId}]`).waitFor()
    await shot(loader, 'fly-operator-tickets-list')
    await loader.close()
  })
})
