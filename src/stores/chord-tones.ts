// A player's Chord Tones figures per chord type and degree (own, or a teacher's student).
import { defineStore } from 'pinia'
import { ref } from 'vue'
import { fetchChordTones, type ChordTonesAnswer } from '../api/progress'
import { useLoadState } from './load-state'

export const useChordTonesStore = defineStore('chord-tones', () => {
  const figures = ref<ChordTonesAnswer | null>(null)
  const { isLoading, error, load } = useLoadState()

  /** Loads the figures of one instrument (or every instrument), for a student or oneself. */
  const fetch = (filter: { student?: string; instrument?: string } = {}) =>
    load(async () => {
      figures.value = await fetchChordTones(filter)
    })

  return { figures, isLoading, error, fetch }
})
