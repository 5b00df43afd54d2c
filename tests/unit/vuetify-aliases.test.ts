import { readFileSync, readdirSync } from 'node:fs'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { vuetifyAliases } from '../../src/plugins/icons/vuetifyAliases.js'
import { projectRoot } from '../../scripts/lib/paths.js'

// The client gives Vuetify only the icon aliases its components ask for, and an empty date adapter. A component
// added later that needs a left-out alias would draw an empty icon, and a date picker would have no dates: these
// checks name the component before anyone sees that.
const vuetifyLib = join(projectRoot, 'node_modules', 'vuetify', 'lib')

function filesUnder(folder: string, ending: RegExp): string[] {
  return readdirSync(folder, { withFileTypes: true }).flatMap((entry) => {
    const path = join(folder, entry.name)
    if (entry.isDirectory()) return filesUnder(path, ending)
    return ending.test(entry.name) ? [path] : []
  })
}

const clientSources = () =>
  filesUnder(join(projectRoot, 'src'), /\.(ts|vue)$/).map((file) => readFileSync(file, 'utf8'))
const kebab = (name: string) => name.replace(/(?<!^)([A-Z])/g, '-$1').toLowerCase()
const usesComponent = (sources: string[], name: string) =>
  sources.some((text) => new RegExp(`<${kebab(name)}[\\s/>]|\\b${name}\\b`).test(text))

/** Alias names in Vuetify's own full SVG set. */
function vuetifyAliasNames(): string[] {
  const text = readFileSync(join(vuetifyLib, 'iconsets', 'mdi-svg.js'), 'utf8')
  return [...text.matchAll(/^ {2}(\w+): 'svg:/gm)].map((match) => match[1]!)
}

/** Vuetify components (by file name) whose code asks for `$alias`. */
function componentsAsking(alias: string, files: Array<{ name: string; text: string }>): string[] {
  const asked = new RegExp(`['"\`]\\$${alias}['"\`]`)
  return files.filter((file) => asked.test(file.text)).map((file) => file.name)
}

describe("Vuetify's icon aliases and date adapter, as the client trims them", () => {
  it('when an alias is left out, then no component the client uses asks for it', () => {
    const names = vuetifyAliasNames()
    expect(names.length).toBeGreaterThan(40)
    const kept = new Set(Object.keys(vuetifyAliases))
    const componentFiles = ['components', 'labs']
      .flatMap((folder) => filesUnder(join(vuetifyLib, folder), /^V\w+\.js$/))
      .map((path) => ({ name: path.split(/[\\/]/).pop()!.replace(/\.js$/, ''), text: readFileSync(path, 'utf8') }))
    const sources = clientSources()
    const broken = names
      .filter((alias) => !kept.has(alias))
      .flatMap((alias) =>
        componentsAsking(alias, componentFiles)
          .filter((component) => usesComponent(sources, component))
          .map((component) => `${component} asks for $${alias}`),
      )
    expect(broken, 'add these aliases to src/plugins/icons/vuetifyAliases.ts').toEqual([])
  })

  it('when the date adapter is left out, then the client uses no date or calendar component', () => {
    const sources = clientSources()
    const dated = ['VDatePicker', 'VDateInput', 'VCalendar'].filter((name) => usesComponent(sources, name))
    expect(dated, 'remove the date-adapter plugin in vite.config.ts to use these').toEqual([])
  })

  it('when the check is tried on a component that needs a left-out alias, then it is caught', () => {
    // The check itself must see a real use: v-rating asks for $ratingFull, which the client leaves out.
    expect(usesComponent(['<v-rating v-model="stars" />'], 'VRating')).toBe(true)
    const rating = readFileSync(join(vuetifyLib, 'components', 'VRating', 'VRating.js'), 'utf8')
    expect(componentsAsking('ratingFull', [{ name: 'VRating', text: rating }])).toEqual(['VRating'])
    expect(Object.keys(vuetifyAliases)).not.toContain('ratingFull')
  })
})
