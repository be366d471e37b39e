// The instrument a drill runs on: the player's active instrument, or a standard 4-string bass until
// it has loaded (or when loading fails; the view shows the error).
import { computed, onMounted } from 'vue'
import { tuningPreset, type AccidentalPreference } from '../../theory'
import { useInstrumentStore } from '../../stores/instruments'

export interface DrillNeck {
  instrumentId: string | null
  name: string
  tuning: number[]
  frets: number
  scaleLengthMm: number
  leftHanded: boolean
  accidentals: AccidentalPreference
  referenceHz: number
  soundOn: boolean
  volume: number
}

/** The FretboardBoard props that follow the instrument (bind with v-bind="neckBoard(neck)"). */
export function neckBoard(neck: DrillNeck) {
  const { tuning, scaleLengthMm, leftHanded, accidentals } = neck
  return { tuning, scaleLengthMm, leftHanded, accidentals }
}

const FALLBACK_PRESET = tuningPreset('bass-4')

export const FALLBACK_NECK: DrillNeck = {
  instrumentId: null,
  name: '4-string bass (standard)',
  tuning: [...FALLBACK_PRESET.pitches],
  frets: FALLBACK_PRESET.frets,
  scaleLengthMm: 864,
  leftHanded: false,
  accidentals: 'flat',
  referenceHz: 440,
  soundOn: true,
  volume: 0.6,
}

export function useDrillNeck() {
  const store = useInstrumentStore()
  onMounted(() => {
    // a failure is kept in store.error and shown by the view
    store.load().catch(() => undefined)
  })
  const neck = computed<DrillNeck>(() => {
    const active = store.active
    if (!active) return FALLBACK_NECK
    return {
      instrumentId: active.id,
      name: active.name,
      tuning: [...active.tuning],
      frets: active.frets,
      scaleLengthMm: active.scaleLengthMm,
      leftHanded: active.handedness === 'left',
      accidentals: active.accidentals,
      referenceHz: active.referenceHz,
      soundOn: active.soundOn,
      volume: active.volume,
    }
  })
  const ready = computed(() => store.loaded)
  /** Loaded, or failed (the drill then runs on the fallback bass): the setup can be shown. */
  const settled = computed(() => store.loaded || store.error !== null)
  return { neck, ready, settled, error: computed(() => store.error), store }
}
