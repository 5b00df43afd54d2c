import '../styles/roboto.css'
import '../styles/print.css'
// Vuetify's base and utility classes without its palette classes (bg-red-lighten-2, ...): colours here come only
// from the theme below, so the palette (about 40 KB of CSS) never reaches a page.
import 'vuetify/styles/core'
import 'vuetify/styles/utilities'
import { createVuetify } from 'vuetify'
import { pathIcons } from './icons/pathIcons'
import { vuetifyAliases } from './icons/vuetifyAliases'

/**
 * Loftledger's own light palette: deep slate for structure, brass for actions that matter. Every colour reads at
 * 4.5:1 or more as text on white and on the background, also on its own 16% tint (tonal chips and alerts).
 */
export const loftledgerTheme = {
  dark: false,
  colors: {
    background: '#f6f4ef',
    surface: '#ffffff',
    primary: '#1f3a4d',
    secondary: '#4b5e70',
    accent: '#85601f',
    error: '#a8231b',
    warning: '#8a4b00',
    info: '#245a75',
    success: '#23663f',
  },
  // Labels, hints and secondary text: Vuetify's 0.6 reads at about 4.2:1; 0.74 keeps them well above 4.5:1.
  variables: { 'medium-emphasis-opacity': 0.74 },
}

export default createVuetify({
  // Vuetify's own icons ($close, $dropdown, ...) come as SVG paths (only those its components here ask for); the views' `mdi-...` names go through the map.
  icons: { defaultSet: 'paths', aliases: vuetifyAliases, sets: { paths: pathIcons } },
  theme: { defaultTheme: 'loftledger', themes: { loftledger: loftledgerTheme } },
  defaults: {
    VTextField: { variant: 'outlined', density: 'comfortable' },
    VSelect: { variant: 'outlined', density: 'comfortable' },
    VTextarea: { variant: 'outlined', density: 'comfortable' },
    VBtn: { rounded: 'md' },
  },
})
