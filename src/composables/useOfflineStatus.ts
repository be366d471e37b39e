// What the app shell says about the connection: offline (or the server out of reach), and how many
// answers wait on this device. The attempts store — and Dexie with it — loads after the shell has
// shown, so the main bundle stays without it; loading it also sends answers left from an offline
// visit. Once signed in, asks the service worker to fetch ahead what a drill needs offline.
import { getActivePinia } from 'pinia'
import { computed, onBeforeUnmount, onMounted, ref, watchEffect, type WatchHandle } from 'vue'

const plural = (n: number) => (n === 1 ? '1 answer' : `${n} answers`)

/** The words for the connection state (and a short form for phones); null when all is well. */
export function offlineMessage(online: boolean, waiting: number, unreachable: boolean) {
  if (!online && !waiting) return { long: 'Offline', short: 'Offline' }
  if (!online)
    return { long: `Offline — ${plural(waiting)} waiting`, short: `Offline · ${waiting}` }
  if (unreachable && waiting)
    return { long: `${plural(waiting)} waiting to be sent`, short: `${waiting} waiting` }
  return null
}

function primeOfflineCache() {
  if (!('serviceWorker' in navigator)) return
  void navigator.serviceWorker.ready.then((registration) =>
    registration.active?.postMessage('prime'),
  )
}

export function useOfflineStatus() {
  const online = ref(navigator.onLine)
  const waiting = ref(0)
  const unreachable = ref(false)
  const pinia = getActivePinia()
  let watching: WatchHandle | undefined
  let mounted = false

  const update = () => {
    online.value = navigator.onLine
    if (online.value) primeOfflineCache()
  }

  onMounted(async () => {
    mounted = true
    window.addEventListener('online', update)
    window.addEventListener('offline', update)
    update()
    const { useAttemptsStore } = await import('../stores/attempts')
    if (!mounted) return
    const attempts = useAttemptsStore(pinia)
    watching = watchEffect(() => {
      waiting.value = attempts.pending
      unreachable.value = attempts.lastError?.status === 0
    })
  })

  onBeforeUnmount(() => {
    mounted = false
    window.removeEventListener('online', update)
    window.removeEventListener('offline', update)
    watching?.stop()
  })

  const message = computed(() => offlineMessage(online.value, waiting.value, unreachable.value))
  return { online, waiting, message }
}
