// "Practise now" links: ?start=1 starts a session as soon as the drill page is ready, once;
// &first=1 makes it a newcomer's short first session (12 questions).
import { watch, type ComputedRef, type Ref } from 'vue'
import { useRoute, useRouter } from 'vue-router'

export const FIRST_SESSION_QUESTIONS = 12

export interface StartableDrill {
  settled: ComputedRef<boolean>
  canStart: ComputedRef<boolean>
  settings: Ref<{ questionCount?: number | null }>
  begin(): Promise<void>
}

export function useStartFromLink(drill: StartableDrill) {
  const route = useRoute()
  const router = useRouter()
  if (route.query.start !== '1') return
  const first = route.query.first === '1'
  let started = false
  watch(
    () => drill.settled.value && drill.canStart.value,
    (ready) => {
      if (!ready || started) return
      started = true
      if (first)
        drill.settings.value = { ...drill.settings.value, questionCount: FIRST_SESSION_QUESTIONS }
      // the link starts once: a reload or "back" shows the setup again
      void router.replace({ query: {} })
      void drill.begin()
    },
    { immediate: true },
  )
}
