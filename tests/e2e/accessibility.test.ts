import type { Page } from 'playwright-core'
import { beforeAll, describe, expect, it } from 'vitest'
import { DEMO_PEOPLE } from '../../server/db/seeders/demo-people.js'
import { axeFindings, describeFindings } from '../support/axe.js'
import { demoInBrowser, signInOnPage } from '../support/demo-in-browser.js'
import { SCREENS, type DemoIds, type Screen } from '../support/screens.js'
import { saveHangOnReadySet } from '../support/ready-set-hang.js'

const suite = demoInBrowser()
const WIDTHS = [
  { name: 'desktop', width: 1440, height: 900 },
  { name: 'phone', width: 390, height: 844 },
] as const
let ids: DemoIds

// A change ticket for the ticket page: the fly operator saves a hang on a ready counterweight set and asks for it.
beforeAll(async () => {
  const { api, set, hangId } = await saveHangOnReadySet(suite.app.url, 'fly@demo.test', 'Act one: gauze', (set) => [
    { label: 'Gauze', category: 'scenery', weight: 120, at: set.battenLength / 2 },
  ])
  const ticket = await api.post('/api/v1/tickets', { hangId }).expect(201)
  ids = { linesetId: set.id, ticketId: ticket.body.id }
})

/** Opens a screen afresh and waits until it has read what it shows. */
async function open(page: Page, screen: Screen) {
  await page.goto(`${suite.app.url}${screen.path(ids)}`)
  await page.locator(screen.ready).first().waitFor()
  await page.waitForLoadState('networkidle')
}

/** axe over the screen as shown, and (on a desktop) as printed. */
async function check(page: Page, where: string, print: boolean) {
  const found = describeFindings(where, await axeFindings(page))
  if (!print) return found
  await page.emulateMedia({ media: 'print' })
  found.push(...describeFindings(`${where} (print)`, await axeFindings(page)))
  await page.emulateMedia({ media: 'screen' })
  return found
}

function expectNoFindings(found: string[]) {
  if (found.length) console.log(`Accessibility findings:\n${found.join('\n')}`)
  expect(found, found.join('\n')).toEqual([])
}

describe('every screen passes axe-core (WCAG 2.1 A and AA) for every role, on a desktop and a phone', () => {
  for (const size of WIDTHS) {
    it(`when a signed-out visitor opens the public screens on a ${size.name}, then axe finds nothing`, async () => {
      const page = await suite.newPage()
      await page.setViewportSize(size)
      const found: string[] = []
      for (const screen of SCREENS.filter((s) => !s.roles)) {
        await open(page, screen)
        found.push(...(await check(page, `signed out / ${size.name} / ${screen.name}`, size.name === 'desktop')))
      }
      await page.context().close()
      expectNoFindings(found)
    })

    for (const person of DEMO_PEOPLE) {
      it(`when the ${person.role} opens every screen of theirs on a ${size.name}, then axe finds nothing`, async () => {
        const page = await suite.newPage()
        await page.setViewportSize(size)
        await signInOnPage(page, `${suite.app.url}/linesets`, person.email)
        await page.locator('[data-testid^=linesets-row-]').first().waitFor()
        const found: string[] = []
        for (const screen of SCREENS.filter((s) => s.roles?.includes(person.role))) {
          await open(page, screen)
          const where = `${person.role} / ${size.name} / ${screen.name}`
          found.push(...(await check(page, where, size.name === 'desktop')))
        }
        if (size.name === 'phone') {
          // The menu as it slides over the page.
          await open(
            page,
            SCREENS.find((s) => s.name === 'linesets list')!,
          )
          await page.locator('[data-testid=app-menu]').click()
          await page.locator('[data-testid=nav-linesets]').waitFor()
          found.push(...(await check(page, `${person.role} / phone / menu open`, false)))
        }
        await page.context().close()
        expectNoFindings(found)
      })
    }
  }
})
