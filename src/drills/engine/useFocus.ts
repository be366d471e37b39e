// Weak spots from the focus selector (GET /api/focus) for Neck Recall and Pitch Hunt, and suggested
// keys for the other drills. Any failure falls back to the drill's own order, and says so.
import { ref } from 'vue'
import { fetchFocus } from '../../api/focus'
import type { DrillId } from '../../contract/drills'
import type { FocusCell } from '../recall/recall-generator'

export interface FocusRequest {
  drill: DrillId
  instrumentId: string | null
  n: number
  region?: { lowString?: number; highString?: number; lowFret: number; highFret: number }
  /** Runs, scatter, cycle: the scale whose keys are ranked. */
  scale?: string
}

export interface SuggestedKey {
  tonic: string
  scale: string
  reason: string
}

export function useFocus() {
  /** A line for the student when focus could not help this time (no history, or a failure). */
  const note = ref<string | null>(null)
  const keys = ref<SuggestedKey[]>([])

  async function load(request: FocusRequest) {
    if (!request.instrumentId) return null
    return fetchFocus({
      drill: request.drill,
      instrument: request.instrumentId,
      n: request.n,
      ...(request.scale ? { scale: request.scale } : {}),
      ...request.region,
    })
  }

  /** The weakest cells first, with the reason each was chosen; [] when focus cannot help. */
  async function weakCells(request: FocusRequest): Promise<FocusCell[]> {
    note.value = null
    try {
      const answer = await load(request)
      const items = answer?.items ?? []
      if (items.length === 0)
        note.value = 'No practice history here yet, so the questions come in the usual order.'
      return items.map(({ string, fret, pitch, reason }) => ({ string, fret, pitch, reason }))
    } catch {
      note.value = 'Your weak spots could not be loaded, so the questions come in the usual order.'
      return []
    }
  }

  /** Keys worth practising (weakest first) for drills that take a key; quietly empty on failure. */
  async function suggestKeys(request: FocusRequest): Promise<SuggestedKey[]> {
    try {
      keys.value = ((await load(request))?.keys ?? []).map(({ tonic, scale, reason }) => ({
        tonic,
        scale,
        reason,
      }))
    } catch {
      keys.value = []
    }
    return keys.value
  }

  return { note, keys, weakCells, suggestKeys }
}
