// What `npm run bench:client` measures in Chromium: bytes over the wire and the sign-in page's time to interactive.
import { chromium, type Browser, type CDPSession, type Page } from 'playwright-core'
import { chromiumLaunchOptions } from './chromium.js'

/** Debian's Chromium, headless, kept off the network; every measurement opens a fresh context (empty cache). */
export function launchBenchChromium(): Promise<Browser> {
  return chromium.launch(chromiumLaunchOptions())
}

export interface WireFigures {
  /** Encoded bytes (headers and bodies as sent) to show the sign-in page. */
  signIn: number
  signInRequests: number
  /** Encoded bytes from a fresh start until the linesets list is shown after signing in. */
  toList: number
  /** The same total split by resource type (script, stylesheet, font, fetch, ...). */
  byKind: Record<string, number>
  /** Every request in order: its URL path and encoded bytes. */
  requests: Array<{ path: string; bytes: number }>
}

/** Sums `Network.loadingFinished.encodedDataLength` for every request the page makes. */
async function wireCounter(page: Page) {
  const cdp: CDPSession = await page.context().newCDPSession(page)
  const kinds = new Map<string, string>()
  const paths = new Map<string, string>()
  const counted = { bytes: 0, requests: 0, byKind: {} as Record<string, number>, list: [] as WireFigures['requests'] }
  cdp.on('Network.requestWillBeSent', (event) => paths.set(event.requestId, new URL(event.request.url).pathname))
  cdp.on('Network.responseReceived', (event) => kinds.set(event.requestId, event.type.toLowerCase()))
  cdp.on('Network.loadingFinished', (event) => {
    const kind = kinds.get(event.requestId) ?? 'other'
    counted.bytes += event.encodedDataLength
    counted.requests += 1
    counted.byKind[kind] = (counted.byKind[kind] ?? 0) + event.encodedDataLength
    counted.list.push({ path: paths.get(event.requestId) ?? '?', bytes: event.encodedDataLength })
  })
  await cdp.send('Network.enable')
  await cdp.send('Network.setCacheDisabled', { cacheDisabled: false })
  return counted
}

/** Opens the sign-in page with an empty cache, then signs in and waits for the linesets list. */
export async function measureWire(
  browser: Browser,
  baseUrl: string,
  person: { email: string; password: string },
): Promise<WireFigures> {
  const context = await browser.newContext({ viewport: { width: 1440, height: 900 } })
  try {
    const page = await context.newPage()
    const counted = await wireCounter(page)
    await page.goto(`${baseUrl}/sign-in`, { waitUntil: 'networkidle' })
    await page.locator('[data-testid=sign-in-form][data-ready=true]:not([data-early])').waitFor()
    const signIn = counted.bytes
    const signInRequests = counted.requests
    await page.locator('[data-testid=sign-in-email] input').fill(person.email)
    await page.locator('[data-testid=sign-in-password] input').fill(person.password)
    await page.locator('[data-testid=sign-in-submit]').click()
    await page.locator('[data-testid^=linesets-row-]').first().waitFor()
    await page.waitForLoadState('networkidle')
    return { signIn, signInRequests, toList: counted.bytes, byKind: counted.byKind, requests: counted.list }
  } finally {
    await context.close()
  }
}

// Runs in the page before any of its scripts (as text: the page's DOM is not this program's). It notes when a
// sign-in form first says it is ready (the plain one in index.html, or the app's), and when the app's own is.
const NOTE_READY = `new MutationObserver((_changes, observer) => {
  if (window.readyAt === undefined && document.querySelector('[data-testid=sign-in-form][data-ready=true]'))
    window.readyAt = performance.now()
  if (document.querySelector('[data-testid=sign-in-form][data-ready=true]:not([data-early])')) {
    window.appReadyAt = performance.now()
    observer.disconnect()
  }
}).observe(document, { subtree: true, childList: true, attributes: true, attributeFilter: ['data-ready'] })`

/** Milliseconds from the start of navigation: until someone can type and press Sign in, and until the app runs it. */
export interface SignInTimes {
  interactive: number
  appReady: number
}

/**
 * Times the sign-in page with the CPU slowed `slowdown` times. A mutation observer installed before any script
 * notes the moments.
 */
export async function timeToInteractive(browser: Browser, url: string, slowdown: number): Promise<SignInTimes> {
  const context = await browser.newContext({ viewport: { width: 390, height: 844 } })
  try {
    const page = await context.newPage()
    const cdp = await context.newCDPSession(page)
    await cdp.send('Emulation.setCPUThrottlingRate', { rate: slowdown })
    await page.addInitScript({ content: NOTE_READY })
    await page.goto(url)
    // Functions, not strings: the app's Content-Security-Policy forbids eval in the page.
    await page.waitForFunction(() => (globalThis as { appReadyAt?: number }).appReadyAt !== undefined)
    return await page.evaluate(() => {
      const noted = globalThis as unknown as { readyAt: number; appReadyAt: number }
      return { interactive: noted.readyAt, appReady: noted.appReadyAt }
    })
  } finally {
    await context.close()
  }
}
