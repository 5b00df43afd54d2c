import { readFileSync, readdirSync } from 'node:fs'
import { join, relative } from 'node:path'
import { describe, expect, it } from 'vitest'
import { ICON_PATHS } from '../../src/plugins/icons/iconPaths.js'
import { projectRoot } from '../../scripts/lib/paths.js'

// A name, not a module path such as vuetify/iconsets/mdi-svg.
const ICON_NAME = /(?<![\w/])mdi-[a-z0-9]+(?:-[a-z0-9]+)*/g

function sourcesUnder(folder: string): string[] {
  return readdirSync(folder, { withFileTypes: true }).flatMap((entry) => {
    const path = join(folder, entry.name)
    if (entry.isDirectory()) return sourcesUnder(path)
    return /\.(ts|vue)$/.test(entry.name) ? [path] : []
  })
}

/** Every `mdi-...` name written in the client or shared code, with the first file that uses it. */
function iconNamesUsed() {
  const used = new Map<string, string>()
  for (const folder of ['src', 'shared'])
    for (const file of sourcesUnder(join(projectRoot, folder))) {
      if (file.endsWith('iconPaths.ts')) continue
      for (const name of readFileSync(file, 'utf8').match(ICON_NAME) ?? [])
        if (!used.has(name)) used.set(name, relative(projectRoot, file))
    }
  return used
}

describe('the icon map holds every icon the app names', () => {
  it('when a view or shared/ names an mdi-... icon, then src/plugins/icons/iconPaths.ts has its path', () => {
    const used = iconNamesUsed()
    expect(used.size).toBeGreaterThan(20)
    const missing = [...used].filter(([name]) => !(name in ICON_PATHS)).map(([name, file]) => `${name} (${file})`)
    expect(missing, 'add these to src/plugins/icons/iconPaths.ts from @mdi/js').toEqual([])
  })

  it('when the map is read, then every entry is SVG path data and none is left over unused', () => {
    const used = iconNamesUsed()
    for (const [name, path] of Object.entries(ICON_PATHS)) {
      expect(path, name).toMatch(/^M[\d.,\sA-Za-z-]+$/)
      expect(used.has(name), `${name} is in the map but no file uses it`).toBe(true)
    }
  })
})
