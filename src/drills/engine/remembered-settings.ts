// The settings a student last used for a drill, kept in this browser so the next visit starts there.
import type { z } from 'zod'
import type { DrillId } from '../../contract/drills'

const storageKey = (drill: DrillId) => `ambitus.drill.${drill}`

/** The remembered settings when they still pass the schema, else null. */
export function loadSettings<S extends z.ZodType>(drill: DrillId, schema: S): z.infer<S> | null {
  try {
    const text = globalThis.localStorage?.getItem(storageKey(drill))
    if (!text) return null
    const parsed = schema.safeParse(JSON.parse(text))
    return parsed.success ? parsed.data : null
  } catch {
    return null // storage blocked or unreadable: start from the defaults
  }
}

const LAST_DRILL_KEY = 'ambitus.last-drill'

export function saveSettings(drill: DrillId, settings: unknown): void {
  try {
    globalThis.localStorage?.setItem(storageKey(drill), JSON.stringify(settings))
    globalThis.localStorage?.setItem(LAST_DRILL_KEY, drill)
  } catch {
    // storage full or blocked: the settings are simply not remembered
  }
}

/** A plain, independent copy of settings (they may arrive as reactive proxies, which cannot be cloned). */
export function copySettings<T>(settings: T): T {
  return JSON.parse(JSON.stringify(settings)) as T
}

/** The drill this browser last started a session of (for "continue where I left off"), or null. */
export function lastDrill(): string | null {
  try {
    return globalThis.localStorage?.getItem(LAST_DRILL_KEY) ?? null
  } catch {
    return null
  }
}
