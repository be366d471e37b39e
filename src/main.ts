// Client entry: create the app, register plugins (Vuetify, Pinia, router, fonts), mount.
import { createApp } from 'vue'
import App from './App.vue'
import { registerPlugins } from './plugins'

const app = createApp(App)
registerPlugins(app)
app.mount('#app')
