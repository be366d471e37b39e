// A drill's settings on the page: the plan item's when practising one, else the ones remembered in
// this browser, else defaults made for the player's instrument once it has loaded (remembered
// settings that do not fit this instrument are replaced by those defaults too).
import { ref, watch, type Ref } from 'vue'
import {
  drillContract,
  settingsOnInstrument,
  type DrillId,
  type DrillSettings,
} from '../../contract/drills'
import { copySettings, loadSettings } from './remembered-settings'
import type { DrillNeck } from './useDrillNeck'
import type { LoadedPlanItem } from './usePlanItem'

export interface DrillSettingsOptions<D extends DrillId> {
  drill: D
  neck: Ref<DrillNeck>
  /** True once the player's instrument has loaded. */
  ready: Ref<boolean>
  planItem: Ref<LoadedPlanItem<D> | null>
  defaults: (neck: DrillNeck) => DrillSettings[D]
  /** Whether settings suit this instrument (e.g. a pitch window inside its range). */
  fits?: (settings: DrillSettings[D], neck: DrillNeck) => boolean
}

export function useDrillSettings<D extends DrillId>(
  options: DrillSettingsOptions<D>,
): Ref<DrillSettings[D]> {
  const { drill, neck } = options
  const remembered = loadSettings(drill, drillContract(drill).settings) as DrillSettings[D] | null
  const settings = ref(remembered ?? options.defaults(neck.value)) as Ref<DrillSettings[D]>
  // a plan's strings counted from the instrument's ends become this instrument's strings
  const onNeck = (item: LoadedPlanItem<D>) =>
    settingsOnInstrument(drill, copySettings(item.settings), neck.value.tuning)

  let checked = false // only when the instrument first arrives; later changes are the student's
  watch(
    options.ready,
    (ready) => {
      if (!ready || checked) return
      checked = true
      const fits = options.fits?.(settings.value, neck.value) ?? true
      const item = options.planItem.value
      if (item) settings.value = onNeck(item)
      else if (!remembered || !fits) settings.value = options.defaults(neck.value)
    },
    { immediate: true },
  )
  watch(options.planItem, (item) => {
    if (item) settings.value = onNeck(item)
  })
  return settings
}
