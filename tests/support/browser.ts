import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { chromium, type BrowserContext } from 'playwright-core'

/** Debian's Chromium, headless, with the flags that keep it off the network, on a fresh profile each launch. */
export async function launchChromium(): Promise<{ context: BrowserContext; close(): Promise<void> }> {
  const profile = mkdtempSync(join(tmpdir(), 'loftledger-chromium-'))
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: '/usr/bin/chromium',
    headless: true,
    viewport: { width: 1440, height: 900 },
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  })
  // Every wait is for a state (a locator, a response); this only bounds how long a slow, busy machine may take.
  context.setDefaultTimeout(60_000)
  return {
    context,
    async close() {
      await context.close()
      rmSync(profile, { recursive: true, force: true })
    },
  }
}
