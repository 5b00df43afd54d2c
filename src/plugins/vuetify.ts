import '../styles/roboto.css'
import 'vuetify/styles'
import { createVuetify } from 'vuetify'
import { aliases } from 'vuetify/iconsets/mdi-svg'
import { pathIcons } from './icons/pathIcons'

/** Loftledger's own light palette: deep slate for structure, brass for actions that matter. */
export const loftledgerTheme = {
  dark: false,
  colors: {
    background: '#f6f4ef',
    surface: '#ffffff',
    primary: '#1f3a4d',
    secondary: '#5b7083',
    accent: '#b7832f',
    error: '#b3261e',
    warning: '#a35c00',
    info: '#2d6a8a',
    success: '#2e7d4f',
  },
}

export default createVuetify({
  // Vuetify's own icons ($close, $dropdown, ...) come as SVG paths; the views' `mdi-...` names go through the map.
  icons: { defaultSet: 'paths', aliases, sets: { paths: pathIcons } },
  theme: { defaultTheme: 'loftledger', themes: { loftledger: loftledgerTheme } },
  defaults: {
    VTextField: { variant: 'outlined', density: 'comfortable' },
    VSelect: { variant: 'outlined', density: 'comfortable' },
    VTextarea: { variant: 'outlined', density: 'comfortable' },
    VBtn: { rounded: 'md' },
  },
})
