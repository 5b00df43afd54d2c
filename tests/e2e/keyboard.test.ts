import type { Page } from 'playwright-core'
import { beforeAll, describe, expect, it } from 'vitest'
import { demoInBrowser, signInOnPage } from '../support/demo-in-browser.js'
import { SCREENS, type DemoIds, type Screen } from '../support/screens.js'
import { saveHangOnReadySet } from '../support/ready-set-hang.js'

const suite = demoInBrowser()
let ids: DemoIds

// A change ticket for the ticket page: the administrator saves a hang on a ready counterweight set and asks for it.
beforeAll(async () => {
  const { api, set, hangId } = await saveHangOnReadySet(
    suite.app.url,
    'admin@demo.test',
    'Act two: cloud border',
    (set) => [{ label: 'Cloud border', category: 'scenery', weight: 90, at: set.battenLength / 2 }],
  )
  const ticket = await api.post('/api/v1/tickets', { hangId }).expect(201)
  ids = { linesetId: set.id, ticketId: ticket.body.id }
})

/**
 * Runs in the page: marks every visible control a person could operate (buttons, links, form fields, anything in
 * the tab order) and notes, from then on, each one that takes focus and whether it then looks different from how
 * it looked unfocused (outline, shadow, border, background, or the overlay and ring Vuetify draws for focus).
 * A group of radio buttons counts as reached when one of them is (Tab stops once per group).
 * Controls taken out of the tab order on purpose (tabindex="-1", e.g. a field's clear icon, whose job the keys
 * already do) and disabled ones are not counted. Transitions are switched off so styles read are final ones.
 */
// Plain script text, not a function: this file compiles for Node, without the browser's types, and the text is
// evaluated in the page through the debugging protocol.
const WATCH_FOCUS = `(() => {
  const CONTROLS =
    'a[href], button, input:not([type=hidden]), select, textarea, [role=button], [role=link], [role=tab], ' +
    '[role=checkbox], [role=combobox], [role=switch], [tabindex]'
  const WRAPPERS = '.v-btn, .v-field, .v-list-item, .v-selection-control, .v-chip, .v-tab, .v-expansion-panel-title'
  const PARTS =
    '.v-btn__overlay, .v-list-item__overlay, .v-chip__overlay, .v-expansion-panel-title__overlay, ' +
    '.v-field__outline, .v-field__outline *, .v-selection-control__input'
  const style = document.createElement('style')
  style.textContent = '*, *::before, *::after { transition: none !important; animation: none !important; }'
  document.head.append(style)

  const look = (element) => {
    const wrapper = element.closest(WRAPPERS) ?? element
    const parts = [element, wrapper, ...wrapper.querySelectorAll(PARTS)]
    return parts
      .flatMap((part) =>
        [getComputedStyle(part), getComputedStyle(part, '::before'), getComputedStyle(part, '::after')].map((s) =>
          [s.outlineStyle, s.outlineWidth, s.outlineColor, s.boxShadow, s.borderTopWidth, s.borderTopColor,
            s.backgroundColor, s.opacity].join(' '),
        ),
      )
      .join('|')
  }
  const visible = (element) => {
    const box = element.getBoundingClientRect()
    return box.width > 0 && box.height > 0 && element.checkVisibility({ visibilityProperty: true })
  }
  const describe = (element) => {
    const id = element.closest('[data-testid]')?.getAttribute('data-testid') ?? ''
    const name = (element.getAttribute('aria-label') ?? element.textContent ?? '').trim().slice(0, 40)
    const kind = element instanceof HTMLInputElement ? '(' + element.type + ':' + element.name + ')' : ''
    return element.tagName.toLowerCase() + kind + (id ? '[' + id + ']' : '') + ' "' + name + '"'
  }
  // Read afresh each time: a part of the page that redraws itself (a panel whose list arrives) puts new elements
  // in place of the old, so controls are known by what they are, not by which element shows them.
  const collect = () =>
    [...document.querySelectorAll(CONTROLS)].filter(
      (element) =>
        visible(element) &&
        element.tabIndex >= 0 &&
        !element.matches(':disabled, [aria-disabled=true]') &&
        !element.closest('[inert], [aria-hidden=true]'),
    )
  const controls = collect()
  const unfocused = new Map(controls.map((element) => [describe(element), look(element)]))
  const reached = new Set()
  const plain = new Set()
  document.addEventListener('focusin', (event) => {
    const target = event.target
    const name = describe(target.closest(CONTROLS) ?? target)
    if (reached.has(name)) return
    reached.add(name)
    if (look(target) === unfocused.get(name)) plain.add(name)
  })
  // Tab enters a group of radio buttons once, at its chosen one; the arrow keys move within it.
  const radioGroupReached = (element) =>
    element instanceof HTMLInputElement &&
    element.type === 'radio' &&
    [...reached].some((name) => name.startsWith('input(radio:' + element.name + ')'))
  globalThis.focusReport = () => ({
    missed: collect()
      .filter((element) => !reached.has(describe(element)) && !radioGroupReached(element))
      .map(describe),
    plain: [...plain],
  })
  return controls.length
})()`

/** Opens a screen afresh, waits until it has read what it shows, and starts noting focus. */
async function open(page: Page, screen: Screen) {
  await page.goto(`${suite.app.url}${screen.path(ids)}`)
  await page.locator(screen.ready).first().waitFor()
  await page.waitForLoadState('networkidle')
  // Start from the top of the document with nothing focused, as a person arriving on the page does (the sign-in
  // page focuses its first field), once Vuetify has drawn that field as unfocused again.
  await page.evaluate('document.activeElement?.blur()')
  await page.locator('.v-field--focused').waitFor({ state: 'detached' })
  return page.evaluate<number>(WATCH_FOCUS)
}

/** Presses Tab at most twice per control (and a few more), stopping once every control has had focus. */
async function tabThrough(page: Page, controls: number) {
  const limit = controls * 2 + 10
  for (let press = 0; press < limit; press += 1) {
    await page.keyboard.press('Tab')
    if (press % 10 === 9) {
      const { missed } = await report(page)
      if (!missed.length) break
    }
  }
  return report(page)
}

const report = (page: Page) => page.evaluate<{ missed: string[]; plain: string[] }>('globalThis.focusReport()')

describe('the keyboard alone reaches every control, and focus shows where it is', () => {
  for (const [who, email] of [
    ['signed out', undefined],
    ['administrator', 'admin@demo.test'],
  ] as const) {
    it(`when ${who === 'signed out' ? 'a visitor' : 'the administrator'} tabs through every screen, then each control takes focus visibly`, async () => {
      const page = await suite.newPage()
      await page.setViewportSize({ width: 1440, height: 900 })
      if (email) {
        await signInOnPage(page, `${suite.app.url}/linesets`, email)
        await page.locator('[data-testid^=linesets-row-]').first().waitFor()
      }
      const problems: string[] = []
      for (const screen of SCREENS.filter((s) => (email ? s.roles?.includes('administrator') : !s.roles))) {
        const controls = await open(page, screen)
        // Every screen has something to operate (at least a link or a button): an empty count means no check.
        if (!controls) problems.push(`${who} / ${screen.name}: no control found to tab to`)
        const { missed, plain } = await tabThrough(page, controls)
        problems.push(...missed.map((control) => `${who} / ${screen.name}: never reached: ${control}`))
        problems.push(...plain.map((control) => `${who} / ${screen.name}: no visible focus: ${control}`))
      }
      await page.context().close()
      if (problems.length) console.log(`Keyboard findings:\n${problems.join('\n')}`)
      expect(problems, problems.join('\n')).toEqual([])
    })
  }
})
