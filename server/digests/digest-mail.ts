// Text of the weekly digest: who practised, who is behind or quiet, the biggest weak spots.
import { publicUrl, type Config } from '../config'
import type { OutgoingMail } from '../lib/mail'
import type { RosterRow } from '../../src/contract/roster'

const pct = (v: number | null) => (v === null ? '–' : `${Math.round(v * 100)} %`)
const minutes = (m: number) => (m > 0 && m < 1 ? '< 1' : String(Math.round(m)))

function practisedLines(rows: RosterRow[]) {
  const practised = rows
    .filter((r) => r.attemptsThisWeek > 0)
    .sort((a, b) => b.minutesThisWeek - a.minutesThisWeek)
  if (!practised.length) return ['Nobody practised this week.']
  return practised.map((r) => {
    const trend = r.recall.direction ? `, recall ${r.recall.direction}` : ''
    return `- ${r.name}: ${minutes(r.minutesThisWeek)} min, ${r.attemptsThisWeek} answers, accuracy ${pct(r.accuracy)}${trend}`
  })
}

function behindLines(rows: RosterRow[]) {
  const behind = rows.filter((r) => r.status === 'behind')
  const quiet = rows.filter((r) => r.status === 'inactive')
  const lines = behind.map(
    (r) =>
      `- ${r.name}: ${r.plans.targetsMet}/${r.plans.targetsTotal} targets, ${r.plans.overdue} plan(s) overdue`,
  )
  lines.push(...quiet.map((r) => `- ${r.name}: no practice in the last 7 days`))
  return lines.length ? lines : ['Everyone is on track.']
}

function weakSpotLines(rows: RosterRow[]) {
  const spots = rows
    .flatMap((r) => r.weakSpots.map((w) => ({ ...w, name: r.name })))
    .sort((a, b) => a.accuracy - b.accuracy || b.attempts - a.attempts)
    .slice(0, 5)
  if (!spots.length) return ['No clear weak spots right now.']
  return spots.map((s) => `- ${s.name}: ${s.label}, ${pct(s.accuracy)} of ${s.attempts} answers`)
}

export function digestMail(
  config: Config,
  teacher: { email: string; name: string },
  rows: RosterRow[],
  week: string,
  onRequest = false,
): OutgoingMail {
  return {
    to: teacher.email,
    // A digest an admin sends now says so, so a second one in a week is not a puzzle.
    subject: `Your studio this week (${week})${onRequest ? ', sent on request' : ''}`,
    text: [
      `Hello ${teacher.name},`,
      '',
      `Here is how your ${rows.length} student${rows.length === 1 ? '' : 's'} did over the last 7 days.`,
      '',
      'Who practised',
      ...practisedLines(rows),
      '',
      'Behind or quiet',
      ...behindLines(rows),
      '',
      'Biggest weak spots (recent answers)',
      ...weakSpotLines(rows),
      '',
      `Open your studio: ${publicUrl(config)}/studio`,
    ].join('\n'),
  }
}
