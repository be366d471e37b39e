// The app bar's connection note: nothing while online, "Offline — N answers waiting" while offline
// (counting the answers queued on this device), and a note when the server stays out of reach.
import 'fake-indexeddb/auto'
import { flushPromises } from '@vue/test-utils'
import { afterEach, describe, expect, it, vi } from 'vitest'
import type { AttemptInput } from '../../src/api/attempts'
import OfflineStatus from '../../src/components/OfflineStatus.vue'
import { offlineMessage } from '../../src/composables/useOfflineStatus'
import { useAttemptsStore } from '../../src/stores/attempts'
import { useAuthStore } from '../../src/stores/auth'
import { attemptInput } from '../helpers/attempt-input'
import { mountWithApp } from '../helpers/mount'

let online = true
Object.defineProperty(navigator, 'onLine', { configurable: true, get: () => online })

function goOffline(offline: boolean) {
  online = !offline
  window.dispatchEvent(new Event(offline ? 'offline' : 'online'))
}

const answer = () => attemptInput()

async function mountStatus(userId: string) {
  const mounted = mountWithApp(OfflineStatus)
  useAuthStore().user = {
    id: userId,
    email: 'x@example.test',
    name: 'X',
    role: 'student',
    createdAt: '',
  }
  return { ...mounted, status: () => mounted.wrapper.find('[data-testid="offline-status"]') }
}

afterEach(() => {
  goOffline(false)
  vi.unstubAllGlobals()
})

describe('connection note in the app bar', () => {
  it.each([
    [true, 0, false, null, null],
    [true, 3, false, null, null],
    [false, 0, false, 'Offline', 'Offline'],
    [false, 1, false, 'Offline — 1 answer waiting', 'Offline · 1'],
    [false, 12, false, 'Offline — 12 answers waiting', 'Offline · 12'],
    [true, 4, true, '4 answers waiting to be sent', '4 waiting'],
  ])(
    'online=%s, %i waiting, unreachable=%s → %s',
    (isOnline, waiting, unreachable, long, short) => {
      const words = offlineMessage(isOnline, waiting, unreachable)
      expect(words?.long ?? null).toBe(long)
      expect(words?.short ?? null).toBe(short)
    },
  )

  it('when the browser goes offline and answers are recorded, then it says how many wait, and goes quiet once they are sent', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => Promise.reject(new TypeError('Failed to fetch'))),
    )
    const { wrapper, status } = await mountStatus('offline-note-player')
    expect(status().exists()).toBe(false)

    goOffline(true)
    await flushPromises()
    expect(status().find('.d-sm-inline').text()).toBe('Offline')
    const attempts = useAttemptsStore()
    attempts.record(answer())
    attempts.record(answer())
    // the composable loads the store on its own, after mounting
    await vi.waitFor(() =>
      expect(status().find('.d-sm-inline').text()).toBe('Offline — 2 answers waiting'),
    )
    expect(status().attributes('data-waiting')).toBe('2')

    const sent = vi.fn(async (_url: string, init: RequestInit) => {
      const { attempts: batch } = JSON.parse(String(init.body)) as { attempts: AttemptInput[] }
      return new Response(JSON.stringify({ stored: batch.length, duplicates: 0, attempts: [] }), {
        status: 201,
        headers: { 'content-type': 'application/json' },
      })
    })
    vi.stubGlobal('fetch', sent)
    goOffline(false) // the store sends at once when the network is back
    await vi.waitFor(() => expect(attempts.pending).toBe(0))
    await flushPromises()
    expect(sent).toHaveBeenCalledTimes(1)
    expect(status().exists()).toBe(false)
    wrapper.unmount()
  })
})
