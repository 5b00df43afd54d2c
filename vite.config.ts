import { fileURLToPath, URL } from 'node:url'
import { defineConfig } from 'vitest/config'
import vue from '@vitejs/plugin-vue'
import vuetify from 'vite-plugin-vuetify'
import { precompress } from './scripts/lib/precompress.js'

const clientPlugins = () => [vue(), vuetify({ autoImport: true })]
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
