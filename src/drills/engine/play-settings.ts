// The click of the "play" mode as this browser last left it, per drill: on or off, the tempo the
// ladder reached, the tolerance around the beat and the click's volume.
import { z } from 'zod'

const PlaySettingsSchema = z.object({
  click: z.boolean().default(true),
  bpm: z.number().int().min(40).max(240).default(72),
  /** How far from the beat (ms, either side) a note still counts as on it. */
  toleranceMs: z.number().int().min(10).max(250).default(60),
  clickVolume: z.number().min(0).max(1).default(0.5),
})
export type PlaySettings = z.infer<typeof PlaySettingsSchema>

const storageKey = (drill: string) => `ambitus.play.${drill}`

export function savedPlaySettings(drill: string): PlaySettings {
  try {
    const text = globalThis.localStorage?.getItem(storageKey(drill))
    const parsed = PlaySettingsSchema.safeParse(text ? JSON.parse(text) : {})
    return parsed.success ? parsed.data : PlaySettingsSchema.parse({})
  } catch {
    return PlaySettingsSchema.parse({}) // storage blocked or unreadable: the defaults
  }
}

export function savePlaySettings(drill: string, settings: PlaySettings): void {
  try {
    globalThis.localStorage?.setItem(storageKey(drill), JSON.stringify(settings))
  } catch {
    // storage full or blocked: the click simply starts from the defaults next time
  }
}
