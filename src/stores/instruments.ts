// The signed-in player's saved instruments and the active one (drills, sound and the board read it).
import { defineStore } from 'pinia'
import { computed, ref } from 'vue'
import * as api from '../api/instruments'
import { sharedWhileRunning, useLoadState } from './load-state'
import { useAuthStore } from './auth'
import type {
  Instrument,
  InstrumentPatch,
  InstrumentPreset,
  NewInstrument,
} from '../api/instruments'

// Keep the server's order: active first, then oldest first.
const sortActiveFirst = (list: Instrument[]) =>
  [...list].sort((a, b) => Number(b.isActive) - Number(a.isActive))

export const useInstrumentStore = defineStore('instruments', () => {
  const instruments = ref<Instrument[]>([])
  const presets = ref<InstrumentPreset[]>([])
  const loaded = ref(false)
  // Whose instruments are loaded: another sign-in in the same tab loads afresh.
  const loadedFor = ref<string | null>(null)
  const { isLoading, error, track } = useLoadState()

  /** Never null after load() for a signed-in player: the server creates a default instrument. */
  const active = computed<Instrument | null>(
    () => instruments.value.find((i) => i.isActive) ?? instruments.value[0] ?? null,
  )

  /** Loads the instruments (and presets); `force` reloads even when already loaded. A load under
   * way (the router starts one for a drill page) is shared, not asked for twice. */
  const load = sharedWhileRunning((force) =>
    track(async () => {
      const userId = useAuthStore().user?.id ?? null
      if (loaded.value && !force && loadedFor.value === userId) return
      const [list, presetList] = await Promise.all([api.listInstruments(), api.listPresets()])
      instruments.value = list.instruments
      presets.value = presetList.presets
      loaded.value = true
      loadedFor.value = userId
    }),
  )

  const create = (body: NewInstrument) =>
    track(async () => {
      const { instrument } = await api.createInstrument(body)
      instruments.value = sortActiveFirst([...instruments.value, instrument])
      return instrument
    })

  const update = (id: string, patch: InstrumentPatch) =>
    track(async () => {
      const { instrument } = await api.updateInstrument(id, patch)
      instruments.value = instruments.value.map((i) => (i.id === id ? instrument : i))
      return instrument
    })

  const remove = (id: string) =>
    track(async () => {
      await api.deleteInstrument(id)
      // The server may have activated another one: read the list again.
      instruments.value = (await api.listInstruments()).instruments
    })

  const activate = (id: string) =>
    track(async () => {
      const { instrument } = await api.activateInstrument(id)
      instruments.value = sortActiveFirst(
        instruments.value.map((i) => (i.id === id ? instrument : { ...i, isActive: false })),
      )
      return instrument
    })

  /** Forgets everything (on sign-out, so the next player starts clean). */
  function reset() {
    load.forget()
    instruments.value = []
    loaded.value = false
    loadedFor.value = null
    error.value = null
  }

  return {
    ...{ instruments, presets, active, loaded, isLoading, error },
    ...{ load, create, update, remove, activate, reset },
  }
})
