import { readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs'
import { join, resolve } from 'node:path'
import { brotliCompressSync, constants, gzipSync } from 'node:zlib'
import type { Plugin } from 'vite'

// Text compresses well; woff2 and images are compressed already and would only grow.
const COMPRESSIBLE = /\.(js|css|html|svg|json|txt|woff)$/
// Below this a compressed copy saves less than its own headers cost.
const SMALLEST = 1024

function filesUnder(folder: string): string[] {
  return readdirSync(folder, { withFileTypes: true }).flatMap((entry) =>
    entry.isDirectory() ? filesUnder(join(folder, entry.name)) : [join(folder, entry.name)],
  )
}

/** Writes `NAME.br` (brotli, best) and `NAME.gz` (gzip, best) beside every compressible file of a folder. */
export function precompressFolder(folder: string) {
  for (const path of filesUnder(folder)) {
    if (!COMPRESSIBLE.test(path) || statSync(path).size < SMALLEST) continue
    const body = readFileSync(path)
    writeFileSync(
      `${path}.br`,
      brotliCompressSync(body, {
        params: { [constants.BROTLI_PARAM_QUALITY]: 11, [constants.BROTLI_PARAM_SIZE_HINT]: body.length },
      }),
    )
    writeFileSync(`${path}.gz`, gzipSync(body, { level: 9 }))
  }
}

/** Vite plugin: once the client is written, compress it so the server sends the copies as they are. */
export function precompress(): Plugin {
  let outDir = ''
  return {
    name: 'loftledger-precompress',
    apply: 'build',
    configResolved(config) {
      outDir = resolve(config.root, config.build.outDir)
    },
    closeBundle() {
      precompressFolder(outDir)
    },
  }
}
