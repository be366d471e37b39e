// Light/dark switch, remembered in this browser.
import { computed } from 'vue'
import { useTheme } from 'vuetify'

export function useThemeToggle() {
  const theme = useTheme()
  const isDark = computed(() => theme.global.current.value.dark)
  function toggle() {
    const next = isDark.value ? 'lakewoodLight' : 'lakewoodDark'
    theme.change(next)
    localStorage.setItem('ambitus.theme', next)
  }
  return { isDark, toggle }
}
