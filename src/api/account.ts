// /api/account: the signed-in user's own settings (the time zone).
import type { TimeZoneSetting } from '../contract/account'
import { http } from './http'

export type { TimeZoneSetting }

export const fetchTimeZone = () => http.get<{ setting: TimeZoneSetting }>('/account/time-zone')
export const chooseTimeZone = (timeZone: string, followsBrowser: boolean) =>
  http.put<{ setting: TimeZoneSetting }>('/account/time-zone', { timeZone, followsBrowser })
/** Tells the server this browser's zone; it keeps it unless the user chose one in Account. */
export const reportBrowserTimeZone = (timeZone: string) =>
  http.post<{ setting: TimeZoneSetting }>('/account/time-zone/browser', { timeZone })
