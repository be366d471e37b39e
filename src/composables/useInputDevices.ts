// Which input to listen to: the inputs this browser offers, the one chosen (remembered per
// browser) and opening it, with the default input when the remembered one is gone.
import { ref } from 'vue'
import type { ListenerSetup } from '@/listen/worklet-messages'
import {
  ListenError,
  saveListenSettings,
  type InputDevice,
  type ListenInput,
  type ListenSession,
} from '@/listen/browser'

export function useInputDevices(input: ListenInput, savedId: string | null) {
  const devices = ref<InputDevice[]>([])
  const deviceId = ref<string | null>(savedId)
  const deviceLabel = ref('')

  async function refresh() {
    if (!input.supported) return
    devices.value = await input.devices().catch(() => [])
  }

  function choose(id: string | null) {
    deviceId.value = id
    saveListenSettings({ deviceId: id })
  }

  // An input remembered from an earlier visit may be gone (unplugged): then the default one.
  async function open(setup: ListenerSetup): Promise<ListenSession> {
    try {
      return await input.open({ ...setup, deviceId: deviceId.value })
    } catch (e) {
      if (!(e instanceof ListenError && e.code === 'no-device' && deviceId.value)) throw e
      choose(null)
      return input.open({ ...setup, deviceId: null })
    }
  }

  return { devices, deviceId, deviceLabel, refresh, choose, open }
}

export type InputDevices = ReturnType<typeof useInputDevices>
