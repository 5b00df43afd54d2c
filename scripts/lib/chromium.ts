import type { LaunchOptions } from 'playwright-core'

/**
 * How the browser tests and the client benchmark start Chromium: Debian's build, headless, with the flags that
 * keep it off the network (no updates, sync or background fetches) so nothing but the app is measured or tested.
 * Playwright gives each launch a fresh profile. A fresh object each call, so no launch changes another's.
 */
export const chromiumLaunchOptions = (): LaunchOptions => ({
  executablePath: '/usr/bin/chromium',
  headless: true,
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
