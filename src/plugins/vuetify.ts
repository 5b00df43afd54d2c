import '@mdi/font/css/materialdesignicons.css'
import '@fontsource/roboto/400.css'
import '@fontsource/roboto/500.css'
import '@fontsource/roboto/700.css'
import 'vuetify/styles'
import { createVuetify } from 'vuetify'

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
  theme: { defaultTheme: 'loftledger', themes: { loftledger: loftledgerTheme } },
  defaults: {
    VTextField: { variant: 'outlined', density: 'comfortable' },
    VSelect: { variant: 'outlined', density: 'comfortable' },
    VTextarea: { variant: 'outlined', density: 'comfortable' },
    VBtn: { rounded: 'md' },
  },
})
