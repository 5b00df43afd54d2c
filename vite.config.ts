import { readdirSync, readFileSync } from 'node:fs'
import { join } from 'node:path'
import { fileURLToPath, URL } from 'node:url'
import type { Plugin } from 'vite'
import { defineConfig } from 'vitest/config'
import vue from '@vitejs/plugin-vue'
import vuetify from 'vite-plugin-vuetify'
import { precompress } from './scripts/lib/precompress.js'

/**
 * axios ships three ways to send a request and picks the first the runtime has: XMLHttpRequest, which every browser
 * has, so its fetch-based adapter (about 24 KB of source) can never be chosen by the client. It is left out.
 */
const axiosWithoutFetch = (): Plugin => ({
  name: 'loftledger:axios-without-fetch',
  enforce: 'pre',
  resolveId(source, importer) {
    if (source === './fetch.js' && importer && /[\\/]axios[\\/]lib[\\/]adapters[\\/]adapters\.js$/.test(importer))
      return '\0axios-fetch-unused'
  },
  load(id) {
    if (id === '\0axios-fetch-unused') return 'export const getFetch = () => undefined\nexport default undefined\n'
  },
})

/** Every word written in the client's own files: the class names its templates and scripts can set. */
function wordsInClient(dir = fileURLToPath(new URL('./src', import.meta.url))): Set<string> {
  const words = new Set<string>()
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const path = join(dir, entry.name)
    if (entry.isDirectory()) wordsInClient(path).forEach((word) => words.add(word))
    else if (/\.(vue|ts)$/.test(entry.name))
      readFileSync(path, 'utf8')
        .match(/[a-z][a-z0-9-]*/g)
        ?.forEach((w) => words.add(w))
  }
  return words
}

/**
 * Vuetify's utility stylesheet repeats every spacing, display and text class for each screen width and for print
 * (`.pa-md-4`, `.d-sm-flex`, `.d-print-none`, ...): about 180 of its 240 KB. Only authors write those classes
 * (Vuetify's components set none), so inside `@media` a rule whose classes appear nowhere in src/ is dropped.
 * The rules outside `@media` all stay: components set those (`elevation-2`, `rounded-lg`, ...) from their props.
 */
const utilitiesInUse = (): Plugin => ({
  name: 'loftledger:utilities-in-use',
  transform(code, id) {
    if (!/[\\/]vuetify[\\/]lib[\\/]styles[\\/]utilities\.css$/.test(id)) return
    const used = wordsInClient()
    const unused = (selector: string) => {
      const classes = selector.match(/\.[a-z][a-z0-9-]*/g) ?? []
      return classes.length > 0 && classes.every((name) => !used.has(name.slice(1)))
    }
    return { code: pruneBlocks(code, false, unused), map: null }
  },
})

/** Walks `prelude { body }` blocks (the file has no braces in strings), dropping unused rules inside @media. */
function pruneBlocks(css: string, inMedia: boolean, unused: (selector: string) => boolean): string {
  let out = ''
  let at = 0
  while (at < css.length) {
    const open = css.indexOf('{', at)
    if (open === -1) return out + css.slice(at)
    let depth = 1
    let close = open + 1
    for (; close < css.length && depth > 0; close += 1) depth += css[close] === '{' ? 1 : css[close] === '}' ? -1 : 0
    const prelude = css.slice(at, open)
    const body = css.slice(open + 1, close - 1)
    const head = prelude.trim()
    if (head.startsWith('@media') || head.startsWith('@layer') || head.startsWith('@supports'))
      out += `${prelude}{${pruneBlocks(body, inMedia || head.startsWith('@media'), unused)}}`
    else if (!(inMedia && unused(head))) out += `${prelude}{${body}}`
    at = close
  }
  return out
}

/**
 * Vuetify's set-up always builds its date adapter (about 22 KB of source) for its date and calendar pickers, which
 * the client does not use: the set-up gets an empty one instead. Whoever adds a date picker removes this plugin.
 */
const withoutDateAdapter = (): Plugin => ({
  name: 'loftledger:without-date-adapter',
  enforce: 'pre',
  resolveId(source, importer) {
    if (source === './composables/date/date.js' && importer && /[\\/]vuetify[\\/]lib[\\/]framework\.js$/.test(importer))
      return '\0vuetify-date-unused'
  },
  load(id) {
    if (id !== '\0vuetify-date-unused') return
    return [
      "export const DateOptionsSymbol = Symbol.for('vuetify:date-options')",
      "export const DateAdapterSymbol = Symbol.for('vuetify:date-adapter')",
      'export const createDate = () => ({ options: {}, instance: {} })',
    ].join('\n')
  },
})

const clientPlugins = () => [
  vue(),
  vuetify({ autoImport: true }),
  axiosWithoutFetch(),
  withoutDateAdapter(),
  utilitiesInUse(),
]
const alias = { '@': fileURLToPath(new URL('./src', import.meta.url)) }

export default defineConfig({
  plugins: [...clientPlugins(), precompress()],
  resolve: { alias },
  // Every component is written with <script setup> (Vuetify's, the router's and Pinia's too), so Vue's options
  // API is left out of the bundle.
  define: { __VUE_OPTIONS_API__: 'false' },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    chunkSizeWarningLimit: 1500,
    // Fonts stay separate files: the server's Content-Security-Policy (font-src 'self') refuses data: URLs.
    assetsInlineLimit: (file) => (/\.(woff2?|ttf|eot|otf)$/.test(file) ? false : undefined),
  },
  server: { proxy: { '/api': 'http://127.0.0.1:3000' } },
  test: {
    // One throwaway PostgreSQL cluster for the whole run; each API test file gets its own database.
    globalSetup: ['tests/support/postgres.global.ts'],
    projects: [
      { test: { name: 'unit', environment: 'node', include: ['tests/unit/**/*.test.ts'] } },
      {
        test: {
          name: 'api',
          environment: 'node',
          include: ['tests/api/**/*.test.ts'],
          // A ceiling, not a wait: the heaviest API tests (50 racing completions, the fuzz of every field,
          // a child process opening a venue) took over 20 s on a two-core machine under other load.
          testTimeout: 60000,
          hookTimeout: 60000,
        },
      },
      {
        plugins: clientPlugins(),
        resolve: { alias },
        test: {
          name: 'components',
          environment: 'jsdom',
          include: ['tests/components/**/*.test.ts'],
          setupFiles: ['tests/support/dom.setup.ts'],
          server: { deps: { inline: ['vuetify'] } },
          // Every wait is for a state; this only bounds how long a whole page (the lineset form and its hang
          // editor) may take to render in jsdom while the full suite keeps both cores busy.
          testTimeout: 30000,
        },
      },
      {
        test: {
          name: 'e2e',
          environment: 'node',
          include: ['tests/e2e/**/*.test.ts'],
          // One at a time: they share the built client in dist/ and the machine's two cores.
          fileParallelism: false,
          testTimeout: 180000,
          hookTimeout: 180000,
        },
      },
    ],
  },
})
