// The signed-in user's time zone: the browser's until they choose one in Account; every date the
// app shows is written in it.
import { defineStore } from 'pinia'
import { computed, ref } from 'vue'
import * as accountApi from '../api/account'
import { displayZone } from '../composables/local-dates'
import { useLoadState } from './load-state'

/** The zone this browser runs in ("Europe/Tallinn"). */
export const browserTimeZone = () => Intl.DateTimeFormat().resolvedOptions().timeZone

export const useTimeZoneStore = defineStore('time-zone', () => {
  const { isLoading, error, load, track } = useLoadState()
  const setting = ref<accountApi.TimeZoneSetting | null>(null)
  /** The zone in force: the saved one, or the browser's until the server has answered. */
  const zone = computed(() => setting.value?.timeZone ?? browserTimeZone())
  let reporting: Promise<void> | null = null
  const apply = (answer: { setting: accountApi.TimeZoneSetting }) => {
    setting.value = answer.setting
    displayZone.value = answer.setting.timeZone
  }

  return {
    ...{ setting, zone, isLoading, error },
    /** Once per page load: reports the browser's zone and learns the one in force. */
    report: () =>
      (reporting ??= load(async () => {
        apply(await accountApi.reportBrowserTimeZone(browserTimeZone()))
      }).finally(() => {
        if (!setting.value) reporting = null // a failed report is tried again on the next page
      })),
    /** Keeps `timeZone`, or (null) follows this browser again. */
    choose: (timeZone: string | null) =>
      track(async () => {
        apply(await accountApi.chooseTimeZone(timeZone ?? browserTimeZone(), timeZone === null))
      }),
  }
})
