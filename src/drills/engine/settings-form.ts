// A drill's settings form, loaded apart from its page (it shows only once the instrument has loaded,
// so it downloads meanwhile); a placeholder keeps the setup card's shape until it arrives.
import { defineAsyncComponent, type Component } from 'vue'
import SettingsFormPending from '@/components/drills/SettingsFormPending.vue'

/** Call in the view's setup with the form's `import()`, so its download starts with the page. */
export function settingsForm<T extends Component>(loading: Promise<{ default: T }>) {
  return defineAsyncComponent({
    loader: () => loading,
    loadingComponent: SettingsFormPending,
    errorComponent: SettingsFormPending,
    delay: 0,
  })
}
