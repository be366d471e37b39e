// The two calibrations on an open session — the noise gate from a quiet room and the output→input
// delay — and their results, remembered per browser.
import { ref, type Ref, type ShallowRef } from 'vue'
import { DEFAULT_GATE_DB } from '@/listen/calibration'
import {
  calibrateDelay,
  calibrateQuietRoom,
  saveListenSettings,
  type DelayMethod,
  type ListenSession,
  type ListenSettings,
} from '@/listen/browser'

export function useListenCalibration(
  session: ShallowRef<ListenSession | null>,
  error: Ref<string>,
  saved: ListenSettings,
) {
  const gateDb = ref(saved.gateDb ?? DEFAULT_GATE_DB)
  const latencyMs = ref<number | null>(saved.latencyMs)
  const calibrating = ref<'quiet-room' | 'delay' | null>(null)

  async function calibrate<T>(
    kind: 'quiet-room' | 'delay',
    work: (open: ListenSession) => Promise<T>,
  ) {
    const open = session.value
    if (!open || calibrating.value) return null
    calibrating.value = kind
    error.value = ''
    try {
      return await work(open)
    } catch (e) {
      error.value = e instanceof Error ? e.message : String(e)
      return null
    } finally {
      calibrating.value = null
    }
  }

  /** Measures 2 s of the quiet room and sets (and remembers) the noise gate from it. */
  const measureQuietRoom = () =>
    calibrate('quiet-room', async (open) => {
      const result = await calibrateQuietRoom(open)
      gateDb.value = result.gateDb
      saveListenSettings({ gateDb: result.gateDb })
      return result
    })

  /** Measures (and remembers) the output→input delay; null result when too few clicks were heard. */
  const measureDelay = (method: DelayMethod) =>
    calibrate('delay', async (open) => {
      const result = await calibrateDelay(open, method)
      if (result) {
        latencyMs.value = Math.round(result.latencyMs)
        saveListenSettings({ latencyMs: latencyMs.value })
      }
      return result
    })

  return { gateDb, latencyMs, calibrating, measureQuietRoom, measureDelay }
}
