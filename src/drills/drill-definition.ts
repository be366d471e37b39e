// Everything the app knows about one drill, in one object: the contract both sides share (id, name,
// settings, attempt detail, description) plus what only the browser needs (route, purpose, icon,
// chart colour, defaults for an instrument, the plan editor's fields, the page).
import type { Component } from 'vue'
import type { z } from 'zod'
import type { DrillContract, DrillContractOf, DrillId, DrillSettings } from '../contract/drills'
import type { FieldSpec } from './setting-fields'

/** The instrument facts a drill's defaults depend on. */
export interface NeckShape {
  tuning: readonly number[]
  frets: number
}

/** A drill's colour in charts (light and dark theme) and the point shape that tells it apart. */
export interface SeriesStyle {
  light: string
  dark: string
  point: 'circle' | 'triangle' | 'rect' | 'rectRot' | 'star' | 'crossRot' | 'cross' | 'dash'
}

/** What only the browser knows about a drill whose settings are S. */
export interface DrillFacts<S> {
  /** The page's path; the route is named practice-<id>. */
  readonly route: string
  /** Why the drill helps, in one line (practice page, drill header). */
  readonly purpose: string
  /** An @mdi/js path. */
  readonly icon: string
  readonly accent: SeriesStyle
  /** The drill plays notes: its page has sound controls and unlocks audio when a session starts. */
  readonly sound: boolean
  /** Settings made for this instrument (a new student's, and a new plan item's on a 4-string bass). */
  defaults(neck: NeckShape): S
  /** Whether remembered settings still suit this instrument (else the defaults replace them). */
  fits?(settings: S, neck: NeckShape): boolean
  /** The plan editor's fields, main ones first and the rest marked advanced. */
  readonly presetFields: readonly FieldSpec[]
  /** The page component, loaded when the route is first visited. */
  page(): Promise<Component | { default: Component }>
}

export type DrillDefinition<D extends DrillId = DrillId> = DrillContractOf<D> &
  DrillFacts<DrillSettings[D]>

/** A drill's definition: its contract with the browser's facts. */
export const defineDrill = <C extends DrillContract>(
  contract: C,
  facts: DrillFacts<z.infer<C['settings']>>,
): C & DrillFacts<z.infer<C['settings']>> => ({ ...contract, ...facts })

/** The route name of a drill's page. */
export const drillRouteName = (id: DrillId) => `practice-${id}`
