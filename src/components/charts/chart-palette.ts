// Our chart colours, one hue per series with a matching point shape and dash, so lines stay apart
// for colour-blind readers and in print; a lighter set for the dark theme.
import type { DrillId } from '@/contract/drills'
import type { SeriesStyle } from '@/drills/drill-definition'
import { DRILLS } from '@/drills/registry'

export type SeriesKey = DrillId | 'all'

/** "All drills" first, then each drill's own colour from its definition. */
export const SERIES_STYLES: Record<SeriesKey, SeriesStyle> = {
  all: { light: '#1E4D6B', dark: '#8CC0E0', point: 'circle' },
  ...(Object.fromEntries(Object.values(DRILLS).map((d) => [d.id, d.accent])) as Record<
    DrillId,
    SeriesStyle
  >),
}

export const colourOf = (key: SeriesKey, dark: boolean) =>
  dark ? SERIES_STYLES[key].dark : SERIES_STYLES[key].light

/** Grid and text colours of the charts in each theme. */
export const chartInk = (dark: boolean) => ({
  text: dark ? '#D8DEE4' : '#2B3138',
  grid: dark ? 'rgba(255,255,255,0.12)' : 'rgba(0,0,0,0.10)',
})
