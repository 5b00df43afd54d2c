import { chromium, type BrowserContext } from 'playwright-core'
import { chromiumLaunchOptions } from '../../scripts/lib/chromium.js'

export interface TestChromium {
  /** One context for tests that need no more. */
  context: BrowserContext
  /**
   * A context of its own (its own cookies and connections) for each person a test signs in: clearing one
   * shared context's cookies races with responses still arriving for a page just closed, which can set the
   * previous person's session cookie again.
   */
  newContext(): Promise<BrowserContext>
  close(): Promise<void>
}

/** Debian's Chromium, headless, with the flags that keep it off the network; Playwright gives it a fresh profile. */
export async function launchChromium(): Promise<TestChromium> {
  const browser = await chromium.launch(chromiumLaunchOptions())
  const newContext = async () => {
    const context = await browser.newContext({ viewport: { width: 1440, height: 900 } })
    // Every wait is for a state (a locator, a response); this only bounds how long a slow, busy machine may take.
    context.setDefaultTimeout(60_000)
    return context
  }
  return { context: await newContext(), newContext, close: () => browser.close() }
}
