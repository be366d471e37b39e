// The app's sound: one PitchPlayer (Tone.js, imported lazily on first use) that tests replace with
// setPitchPlayer(fake), and useSound() wiring it to the active instrument's settings.
import type { PitchPlayer } from './pitch-player'
import { createLazyPlayer } from './lazy-player'

export type { PitchPlayer } from './pitch-player'
export { useSound } from './useSound'

let player: PitchPlayer | null = null
let lazy: ReturnType<typeof createLazyPlayer> | null = null

/** The app-wide player. Call `start()` from a click or key press before the first note. */
export function getPitchPlayer(): PitchPlayer {
  if (player) return player
  lazy ??= createLazyPlayer(async () => (await import('./tone-player')).createTonePlayer())
  return lazy
}

/** Replaces the player (tests: a fake that records calls); null restores the Tone.js one. */
export function setPitchPlayer(fake: PitchPlayer | null): void {
  player = fake
}

/** Starts downloading Tone.js in the background (a page that will play sound calls this early). */
export function preloadSound(): void {
  if (!player) (getPitchPlayer() as ReturnType<typeof createLazyPlayer>).preload()
}
