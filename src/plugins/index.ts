// Registers every app-wide plugin in one place.
import type { App } from 'vue'
import { createPinia } from 'pinia'
import '@fontsource/roboto/latin-400.css'
import '@fontsource/roboto/latin-500.css'
import '@fontsource/roboto/latin-700.css'
import '@fontsource/fraunces/latin-600.css'
import '@fontsource/fraunces/latin-700.css'
import '../styles/accidentals.css'
import '../styles/main.css'
import '../styles/typography.css'
import '../styles/identity.css'
import router from '../router'
import vuetify from './vuetify'

export function registerPlugins(app: App) {
  app.use(createPinia())
  app.use(vuetify)
  app.use(router)
}
