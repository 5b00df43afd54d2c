import { readdirSync, statSync } from 'node:fs'
import { extname, join, relative, sep } from 'node:path'
import type { Request, RequestHandler } from 'express'

/** A file of the built client, and the compressed copies the build wrote beside it. */
interface ClientFile {
  path: string
  brotli: boolean
  gzip: boolean
}

const CONTENT_TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.json': 'application/json; charset=utf-8',
  '.txt': 'text/plain; charset=utf-8',
  '.woff2': 'font/woff2',
  '.woff': 'font/woff',
  '.png': 'image/png',
  '.ico': 'image/x-icon',
}

// Vite names everything under assets/ by its content's hash, so a copy can be kept for good. index.html names
// those files, so it is asked again each time (cheaply, by its ETag); other files (the icon) keep an hour.
const FOREVER = 'public, max-age=31536000, immutable'
const ASK_AGAIN = 'no-cache'
const AN_HOUR = 'public, max-age=3600'

function listFiles(folder: string): string[] {
  return readdirSync(folder, { withFileTypes: true }).flatMap((entry) =>
    entry.isDirectory() ? listFiles(join(folder, entry.name)) : [join(folder, entry.name)],
  )
}

/** URL path (`/assets/index-abc.js`) -> the file, read once: the built client does not change while serving. */
function clientFiles(clientDir: string): Map<string, ClientFile> {
  const files = listFiles(clientDir)
  const present = new Set(files)
  const found = new Map<string, ClientFile>()
  for (const path of files) {
    if (path.endsWith('.br') || path.endsWith('.gz')) continue
    const url = `/${relative(clientDir, path).split(sep).join('/')}`
    found.set(url, { path, brotli: present.has(`${path}.br`), gzip: present.has(`${path}.gz`) })
  }
  return found
}

/** The compressed copy this browser takes, brotli first (every browser that takes brotli also takes gzip). */
function encodingFor(req: Request, file: ClientFile): 'br' | 'gzip' | undefined {
  if (file.brotli && req.acceptsEncodings('br') === 'br') return 'br'
  if (file.gzip && req.acceptsEncodings('gzip') === 'gzip') return 'gzip'
  return undefined
}

/**
 * Serves the built client: the build's brotli or gzip copy when the browser takes it (with `Content-Encoding`
 * and `Vary: Accept-Encoding`), hashed assets cached for a year, and index.html for every other page path.
 */
export function clientAssets(clientDir: string): RequestHandler {
  const files = clientFiles(clientDir)
  const index = files.get('/index.html')!
  return (req, res, next) => {
    if (req.method !== 'GET' && req.method !== 'HEAD') return next()
    const asked = files.get(req.path)
    // A missing file under assets/ is a 404, not the app: an old page asking for a replaced chunk must fail.
    if (!asked && req.path.startsWith('/assets/')) return next()
    const file = asked ?? index
    const encoding = encodingFor(req, file)
    const hashed = file !== index && req.path.startsWith('/assets/')
    res.set({
      'Content-Type': CONTENT_TYPES[extname(file.path)] ?? 'application/octet-stream',
      'Cache-Control': file === index ? ASK_AGAIN : hashed ? FOREVER : AN_HOUR,
    })
    if (file.brotli || file.gzip) res.vary('Accept-Encoding')
    if (encoding) res.set('Content-Encoding', encoding)
    const sent = encoding === 'br' ? `${file.path}.br` : encoding === 'gzip' ? `${file.path}.gz` : file.path
    res.sendFile(sent, { cacheControl: false, lastModified: !hashed, dotfiles: 'allow' }, (error) => {
      if (error && !res.headersSent) next(error)
    })
  }
}

/** True when the folder holds a built client. */
export function hasBuiltClient(clientDir: string): boolean {
  try {
    return statSync(join(clientDir, 'index.html')).isFile()
  } catch {
    return false
  }
}
