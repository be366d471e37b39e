// Exercise links: the signed-in player's own (made, listed, revoked) and the one a visitor opened.
import { defineStore } from 'pinia'
import { ref } from 'vue'
import * as api from '../api/shares'
import type { NewShare, SharedExercise, ShareLink } from '../api/shares'
import { useLoadState } from './load-state'

export const useSharesStore = defineStore('shares', () => {
  const links = ref<ShareLink[]>([])
  const opened = ref<SharedExercise | null>(null)
  const { isLoading, error, load, track } = useLoadState()

  return {
    links,
    opened,
    isLoading,
    error,
    /** The player's links, newest first (revoked ones marked). */
    loadLinks: () => load(async () => (links.value = (await api.listShares()).shares)),
    /** Makes a link; the new one heads the list. */
    create: (body: NewShare) =>
      track(async () => {
        const { share } = await api.createShare(body)
        links.value = [share, ...links.value.filter((link) => link.token !== share.token)]
        return share
      }),
    revoke: (token: string) =>
      track(async () => {
        await api.revokeShare(token)
        const revokedAt = new Date().toISOString()
        links.value = links.value.map((link) =>
          link.token === token ? { ...link, revokedAt } : link,
        )
      }),
    /** Opens a link without an account; a withdrawn (410) or unknown (404) one leaves `error`. */
    open: (token: string) =>
      load(async () => {
        opened.value = null
        opened.value = (await api.readShare(token)).share
      }),
  }
})
