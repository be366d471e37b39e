// What client and server agree on about one drill: its id and name, its settings, what its attempts
// carry in `detail`, the extras the focus selector adds for it, and how a preset reads in words.
import type { z } from 'zod'

/** A problem a plan item with these settings would meet, at a path inside the settings. */
export interface SettingsIssue {
  path: (string | number)[]
  message: string
}

export interface DrillContract<
  Id extends string = string,
  S extends z.ZodType = z.ZodType,
  Dt extends z.ZodType = z.ZodType,
> {
  readonly id: Id
  /** The drill's name as people read it ("Neck Recall"). */
  readonly name: string
  /** The settings a session runs with (a plan item's preset holds them). */
  readonly settings: S
  /** What an attempt of this drill carries in `detail` (the client's side of the contract). */
  readonly detail: Dt
  /** What GET /api/focus adds for this drill: keys of a scale ranked, 5-fret hand regions ranked. */
  readonly focus: { keys: boolean; regions: boolean }
  /** The settings in one line, without the session length ("C major, frets 2–5"). */
  describe(settings: z.infer<S>): string
  /** The keys a preset plays in order; a drill with it offers the "every key" target. */
  keysOf?(settings: z.infer<S>): string[]
  /**
   * A plan item's settings made concrete for the student's instrument (open strings, lowest
   * first), e.g. strings counted from the highest; absent: the settings apply as they are.
   */
  onInstrument?(settings: z.infer<S>, tuning: readonly number[]): z.infer<S>
  /** Why a plan item with these settings could not be practised (empty: it can). */
  presetIssues?(settings: z.infer<S>): SettingsIssue[]
}

/** Declares a drill contract, keeping its id a literal type. */
export const defineDrillContract = <Id extends string, S extends z.ZodType, Dt extends z.ZodType>(
  contract: DrillContract<Id, S, Dt>,
) => contract
