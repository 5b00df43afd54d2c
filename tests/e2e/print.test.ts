import { join } from 'node:path'
import { statSync } from 'node:fs'
import type { Page } from 'playwright-core'
import { beforeAll, describe, expect, it } from 'vitest'
import { artifacts, demoInBrowser, signInOnPage } from '../support/demo-in-browser.js'
import { saveHangOnReadySet } from '../support/ready-set-hang.js'

// The lineset page, with its batten diagram, printed on both of the paper sizes a theatre office is likely to have.
// Every wait is for a state on the page, never for a time.

const suite = demoInBrowser()
const MARGIN_MM = 12
const CSS_PX_PER_MM = 96 / 25.4
/** Paper widths in millimetres (source: ISO 216 for A4; ANSI/ASME Y14.1 for US letter, 8.5 in). */
const PAPERS = [
  { format: 'A4', widthMm: 210, heightMm: 297 },
  { format: 'Letter', widthMm: 215.9, heightMm: 279.4 },
] as const
let linesetId: string

// A lineset with items on its batten, so the diagram draws markers, labels, the moment and the shape.
beforeAll(async () => {
  const { set } = await saveHangOnReadySet(suite.app.url, 'fly@demo.test', 'Act one: forest wings', (set) => [
    { label: 'Forest border', category: 'scenery', weightPerLength: 3, from: 0, to: set.battenLength },
    { label: 'Lantern cluster', category: 'lighting', weight: 85, at: set.battenLength / 4 },
  ])
  linesetId = set.id
})

/**
 * Where the diagram's drawing and its content sit, in CSS pixels, with the page laid out for print. Script text,
 * not a function: this file compiles for Node, without the browser's types.
 */
const MEASURE_DIAGRAM = `(() => {
  const svg = document.querySelector('[data-testid=hang-pictures] [data-testid=batten-diagram] svg')
  const box = svg.getBoundingClientRect()
  const content = svg.getBBox()
  return {
    left: box.left,
    right: box.right,
    pageWidth: document.documentElement.scrollWidth,
    contentLeft: content.x,
    contentRight: content.x + content.width,
    viewWidth: svg.viewBox.baseVal.width,
  }
})()`

type DiagramPlace = Record<'left' | 'right' | 'pageWidth' | 'contentLeft' | 'contentRight' | 'viewWidth', number>
const measureDiagram = (page: Page) => page.evaluate<DiagramPlace>(MEASURE_DIAGRAM)

describe('printing the lineset page', () => {
  for (const paper of PAPERS) {
    it(`when the lineset page is printed on ${paper.format}, then the whole batten diagram fits across the page`, async () => {
      const page = await suite.newPage()
      await signInOnPage(page, `${suite.app.url}/linesets/${linesetId}`, 'fly@demo.test')
      await page.locator('[data-testid=hang-pictures] [data-testid=batten-diagram]').waitFor()
      await page.locator('[data-testid=diagram-item-point]').first().waitFor()
      await page.waitForLoadState('networkidle')

      // Lay the page out as the printer will: print media, the paper's width less its margins.
      const printable = Math.floor((paper.widthMm - 2 * MARGIN_MM) * CSS_PX_PER_MM)
      await page.emulateMedia({ media: 'print' })
      await page.setViewportSize({ width: printable, height: Math.floor(paper.heightMm * CSS_PX_PER_MM) })
      await page.locator('.v-navigation-drawer').first().waitFor({ state: 'hidden' })
      const diagram = await measureDiagram(page)
      expect(diagram.left).toBeGreaterThanOrEqual(0)
      expect(diagram.right).toBeLessThanOrEqual(printable)
      expect(diagram.pageWidth).toBeLessThanOrEqual(printable)
      // Nothing drawn outside the drawing's own frame (a label past an end would be cut off on paper).
      expect(diagram.contentLeft).toBeGreaterThanOrEqual(0)
      expect(diagram.contentRight).toBeLessThanOrEqual(diagram.viewWidth)

      const name = `print-lineset-${paper.format.toLowerCase()}`
      await page
        .locator('[data-testid=hang-pictures] [data-testid=batten-diagram]')
        .screenshot({ path: join(artifacts, `${name}-diagram.png`) })
      const margin = `${MARGIN_MM}mm`
      const pdf = join(artifacts, `${name}.pdf`)
      await page.pdf({
        path: pdf,
        format: paper.format,
        margin: { top: margin, bottom: margin, left: margin, right: margin },
      })
      expect(statSync(pdf).size).toBeGreaterThan(10_000)
      await page.context().close()
    })
  }
})
