// How roster figures read in the table and on the student page.
import type { RosterRow, RosterStatus } from '@/api/roster'
import { toUnicode } from '@/theory'
import { calendarDaysBetween } from '@/contract/local-time'
import { drillName } from '@/contract/drills'
import { ROSTER_STATUS_TEXT } from '@/contract/roster'
import { dateText, shownZone } from '@/composables/local-dates'

export const STATUS_LABEL: Record<RosterStatus, { text: string; color: string }> = {
  behind: { text: ROSTER_STATUS_TEXT.behind, color: 'error' },
  inactive: { text: ROSTER_STATUS_TEXT.inactive, color: 'warning' },
  'on-track': { text: ROSTER_STATUS_TEXT['on-track'], color: 'success' },
}

export const percent = (v: number | null) => (v === null ? '–' : `${Math.round(v * 100)} %`)

/** The viewer's IANA time zone (their account's). */
export const viewerTimeZone = shownZone

/** "today", "yesterday", "3 days ago": calendar days in the viewer's time zone, not 24-hour blocks. */
export function lastPractice(
  iso: string | null,
  now = new Date(),
  timeZone = viewerTimeZone(),
): string {
  if (!iso) return 'never'
  const days = calendarDaysBetween(new Date(iso), now, timeZone)
  if (days <= 0) return 'today'
  if (days === 1) return 'yesterday'
  if (days < 14) return `${days} days ago`
  return dateText(iso)
}

/** "12 % faster (1.4 s)", "steady (1.9 s)", or "–" without two weeks of figures. */
export function recallText(recall: RosterRow['recall']): string {
  const median = recall.medianMs === null ? '' : ` (${(recall.medianMs / 1000).toFixed(1)} s)`
  if (recall.direction === null || recall.change === null)
    return recall.medianMs === null ? '–' : `median${median}`
  if (recall.direction === 'steady') return `steady${median}`
  return `${Math.round(Math.abs(recall.change) * 100)} % ${recall.direction}${median}`
}

export const planText = (row: RosterRow) =>
  row.plans.assigned === 0
    ? 'no plans'
    : `${row.plans.targetsMet}/${row.plans.targetsTotal} targets`

export const spotText = (w: RosterRow['weakSpots'][number]) =>
  `${toUnicode(w.label)} · ${percent(w.accuracy)}`

/** Whole minutes; a short first session still shows as practice. */
export const minutesText = (minutes: number) =>
  minutes > 0 && minutes < 1 ? '< 1' : String(Math.round(minutes))

/** "96 BPM · Range Runs", or "—" when no take was played clean in the last 7 days. */
export const tempoText = (tempo: RosterRow['fastestTempo']) =>
  tempo ? `${tempo.bpm} BPM · ${drillName(tempo.drill)}` : '—'
