// /api/focus endpoint: the next questions for a drill, weakest places first, each with its reason.
import type { FocusAnswer, FocusItem } from '../contract/focus'
import type { KeyFocus, RegionFocus } from '../contract/focus'
import type { DrillId } from '../contract/drills'
import { http } from './http'

export type { FocusAnswer, FocusItem, KeyFocus, RegionFocus }

export interface FocusParams {
  drill: DrillId
  /** The player's instrument id (their active one when left out). */
  instrument?: string
  /** How many questions (1–100, default 24). */
  n?: number
  lowString?: number
  highString?: number
  lowFret?: number
  highFret?: number
  /** Scale whose keys are ranked for runs, scatter and cycle (default major). */
  scale?: string
  /** Makes the draw reproducible. */
  seed?: number
}

export const fetchFocus = (params: FocusParams) =>
  http.get<FocusAnswer>('/focus', { query: { ...params } })
