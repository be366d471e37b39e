// Our chart colours, one hue per series with a matching point shape and dash, so lines stay apart
// for colour-blind readers and in print; a lighter set for the dark theme.
import type { DrillId } from '@/drills/drill-settings'

export type SeriesKey = DrillId | 'all'

interface SeriesStyle {
  light: string
  dark: string
  point: 'circle' | 'triangle' | 'rect' | 'rectRot' | 'star' | 'crossRot'
}

export const SERIES_STYLES: Record<SeriesKey, SeriesStyle> = {
  all: { light: '#1E4D6B', dark: '#8CC0E0', point: 'circle' },
  recall: { light: '#A85A24', dark: '#E8A36B', point: 'triangle' },
  hunt: { light: '#2F7A6F', dark: '#7FC4B9', point: 'rect' },
  runs: { light: '#6E4A8A', dark: '#C7A6DE', point: 'rectRot' },
  scatter: { light: '#6A6A1C', dark: '#CFCF72', point: 'star' },
  cycle: { light: '#4F5B69', dark: '#B9C2CE', point: 'crossRot' },
}

export const colourOf = (key: SeriesKey, dark: boolean) =>
  dark ? SERIES_STYLES[key].dark : SERIES_STYLES[key].light

/** Grid and text colours of the charts in each theme. */
export const chartInk = (dark: boolean) => ({
  text: dark ? '#D8DEE4' : '#2B3138',
  grid: dark ? 'rgba(255,255,255,0.12)' : 'rgba(0,0,0,0.10)',
})
