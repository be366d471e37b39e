// Every drill of the app, by id: the router, the practice page's cards, the chart colours, the plan
// editor and the progress filters read it. Adding a drill: its folder under src/drills/ (with a
// definition.ts), its contract in src/contract/drills/, and one line here.
import { DRILL_IDS, type DrillId } from '../contract/drills'
import type { DrillDefinition } from './drill-definition'
import { chordsDrill } from './chords/definition'
import { cycleDrill } from './cycle/definition'
import { huntDrill } from './hunt/definition'
import { recallDrill } from './recall/definition'
import { runsDrill } from './runs/definition'
import { scatterDrill } from './scatter/definition'

export const DRILLS: { readonly [D in DrillId]: DrillDefinition<D> } = {
  recall: recallDrill,
  hunt: huntDrill,
  runs: runsDrill,
  scatter: scatterDrill,
  cycle: cycleDrill,
  chords: chordsDrill,
}

/** The drills in the order the practice page shows them. */
export const DRILL_LIST: readonly DrillDefinition[] = DRILL_IDS.map(
  (id) => DRILLS[id] as DrillDefinition,
)

/** One drill's definition. */
export const drillDefinition = <D extends DrillId>(id: D): DrillDefinition<D> =>
  DRILLS[id] as DrillDefinition<D>
