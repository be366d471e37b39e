// /api/shares endpoints: make, list and revoke exercise links; read one by its token (no account).
import type { ShareCreate, SharedExercise, ShareLink } from '../contract/shares'
import { http } from './http'

export type { ShareCreate, SharedExercise, ShareLink }

/** What POST accepts (the fingering may be left out). */
export type NewShare = Omit<ShareCreate, 'fingering'> & { fingering?: string | null }

const at = (token: string) => `/shares/${encodeURIComponent(token)}`

export const createShare = (body: NewShare) => http.post<{ share: ShareLink }>('/shares', body)
export const listShares = () => http.get<{ shares: ShareLink[] }>('/shares')
export const readShare = (token: string) => http.get<{ share: SharedExercise }>(at(token))
export const revokeShare = (token: string) => http.delete<void>(at(token))

/** The address a link opens (on this site). */
export const shareUrl = (token: string, origin = globalThis.location?.origin ?? '') =>
  `${origin}/shared/${token}`
