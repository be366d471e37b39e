// Turns the timeline answer into chart.js data: one label per day of the range, gaps (null) on days
// without practice, a solid median line per series and a dashed p90 line for the main series.
import type { TimelineAnswer, TimelinePoint } from '@/api/progress'
import { daysBetween, drillName, shortDay } from '../progress/progress-format'
import { colourOf, SERIES_STYLES, type SeriesKey } from './chart-palette'

export interface LineDataset {
  label: string
  data: (number | null)[]
  borderColor: string
  backgroundColor: string
  borderDash?: number[]
  borderWidth: number
  pointStyle: string
  pointRadius: number
  spanGaps: boolean
}

function valuesByDay(
  days: string[],
  points: TimelinePoint[],
  value: (p: TimelinePoint) => number | null,
) {
  const byDay = new Map(points.map((p) => [p.day, value(p)]))
  return days.map((d) => byDay.get(d) ?? null)
}

function line(
  key: SeriesKey,
  label: string,
  data: (number | null)[],
  dark: boolean,
  dashed = false,
): LineDataset {
  const colour = colourOf(key, dark)
  return {
    label,
    data,
    borderColor: colour,
    backgroundColor: colour,
    borderWidth: dashed ? 1.5 : 2.5,
    pointStyle: SERIES_STYLES[key].point,
    pointRadius: dashed ? 0 : 3.5,
    spanGaps: true,
    ...(dashed ? { borderDash: [6, 4] } : {}),
  }
}

/** Median (and, for the first series, p90) recall time in seconds per day. */
export function speedData(timeline: TimelineAnswer, dark: boolean) {
  const days = daysBetween(timeline.from, timeline.to)
  const sec = (ms: number | null) => (ms === null ? null : Math.round(ms / 100) / 10)
  const datasets = timeline.series.flatMap((s, i) => {
    const name = drillName(s.drill)
    const median = line(
      s.drill,
      `${name}: median`,
      valuesByDay(days, s.points, (p) => sec(p.medianMs)),
      dark,
    )
    if (i > 0) return [median]
    return [
      median,
      line(
        s.drill,
        `${name}: slowest 10 % (p90)`,
        valuesByDay(days, s.points, (p) => sec(p.p90Ms)),
        dark,
        true,
      ),
    ]
  })
  return { labels: days.map(shortDay), datasets }
}

/** Accuracy in percent per day and series. */
export function accuracyData(timeline: TimelineAnswer, dark: boolean) {
  const days = daysBetween(timeline.from, timeline.to)
  const datasets = timeline.series.map((s) =>
    line(
      s.drill,
      drillName(s.drill),
      valuesByDay(days, s.points, (p) => Math.round(p.accuracy * 1000) / 10),
      dark,
    ),
  )
  return { labels: days.map(shortDay), datasets }
}

/** A sentence describing a series' first and latest practised day, for screen readers and captions. */
export function trendSentence(timeline: TimelineAnswer, what: 'speed' | 'accuracy'): string {
  const main = timeline.series[0]
  const first = main?.points[0]
  const last = main?.points.at(-1)
  if (!main || !first || !last) return 'No practice in this period.'
  const value = (p: TimelinePoint) =>
    what === 'speed'
      ? p.medianMs === null
        ? 'no right answers'
        : `${(p.medianMs / 1000).toFixed(1)} s`
      : `${Math.round(p.accuracy * 100)} %`
  const label = what === 'speed' ? 'Median recall time' : 'Accuracy'
  if (first.day === last.day) return `${label} on ${shortDay(first.day)}: ${value(first)}.`
  return `${label}: ${value(first)} on ${shortDay(first.day)}, ${value(last)} on ${shortDay(last.day)}.`
}
