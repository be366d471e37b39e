// Vuetify with Ambitus's own palette ("lakewood": lake blue, rosewood amber, warm paper) and mdi-svg icons.
import 'vuetify/styles'
import { createVuetify, type ThemeDefinition } from 'vuetify'
import { aliases, mdi } from 'vuetify/iconsets/mdi-svg'

const lakewoodLight: ThemeDefinition = {
  dark: false,
  colors: {
    background: '#F5F0E6',
    surface: '#FFFDF8',
    'surface-variant': '#E9E2D6',
    primary: '#1E4D6B',
    secondary: '#A85A24',
    accent: '#3E7C74',
    success: '#1F6FB2',
    error: '#B8360F',
    warning: '#8A5A00',
    info: '#3C5A8A',
    'app-bar': '#173C54',
    'on-app-bar': '#FFFFFF',
  },
  // labels and hints in fields stack two opacities: these keep them at WCAG AA contrast
  variables: { 'medium-emphasis-opacity': 0.74, 'disabled-opacity': 0.5 },
}

const lakewoodDark: ThemeDefinition = {
  dark: true,
  colors: {
    background: '#12171C',
    surface: '#1B2229',
    'surface-variant': '#2A333C',
    primary: '#8CC0E0',
    secondary: '#E8A36B',
    accent: '#7FC4B9',
    success: '#6CB4F0',
    error: '#FF8A65',
    warning: '#E0B050',
    info: '#A7BDE3',
    // the bar stays dark at night (primary is a light blue there)
    'app-bar': '#161D24',
    'on-app-bar': '#E6EEF4',
  },
  variables: { 'medium-emphasis-opacity': 0.8, 'disabled-opacity': 0.55 },
}

const storedTheme =
  typeof localStorage === 'undefined' ? null : localStorage.getItem('ambitus.theme')

export default createVuetify({
  theme: {
    defaultTheme: storedTheme === 'lakewoodDark' ? 'lakewoodDark' : 'lakewoodLight',
    themes: { lakewoodLight, lakewoodDark },
  },
  icons: { defaultSet: 'mdi', aliases, sets: { mdi } },
  defaults: {
    VBtn: { rounded: 'lg' },
    VCard: { rounded: 'lg' },
    VTextField: { variant: 'outlined', density: 'comfortable' },
    VSelect: { variant: 'outlined', density: 'comfortable' },
  },
})
