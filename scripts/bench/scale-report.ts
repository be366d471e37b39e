// Figures of the scale benchmark: per table, rows and bytes per learner per day (or per learner, for
// tables that stop growing), how it would be distributed, and a year of storage for 10 k to 1 M.
export interface TableSize {
  name: string
  rows: number
  bytes: number
}

/** Tables that grow with a learner's practice days; every other table grows with learners only. */
const PER_DAY = new Set([
  'attempts',
  'progress_days',
  'progress_sessions',
  'progress_runs',
  'recordings',
  'plan_assignments',
  'plans',
  'plan_items',
  'captured_mail',
  'notification_log',
])
/** Distributed by the student (Citus: the player's id is the distribution column, co-located). */
const BY_STUDENT = new Set([
  'attempts',
  'progress_days',
  'progress_sessions',
  'progress_runs',
  'progress_items',
  'focus_cards',
  'rollup_queue',
  'instruments',
  'user_time_zones',
  'recordings',
  'plan_assignments',
  'sessions',
  'users',
  'studio_members',
])
const LEARNERS = [10_000, 100_000, 1_000_000]

const mb = (bytes: number) => `${(bytes / 1e6).toFixed(1)} MB`
const human = (bytes: number) =>
  bytes >= 1e12 ? `${(bytes / 1e12).toFixed(2)} TB` : `${(bytes / 1e9).toFixed(1)} GB`

interface Run {
  learners: number
  days: number
  sentBytesPerAnswer: number
  takeBytes: number
}

/** Prints the per-table table, the baseline, and the yearly projection. */
export function growthReport(sizes: TableSize[], run: Run) {
  const learnerDays = run.learners * run.days
  let perDay = 0
  let perLearner = 0
  console.log(
    '  table                  rows   size    per learner-day     per learner   distribute',
  )
  for (const t of sizes) {
    const daily = PER_DAY.has(t.name)
    if (daily) perDay += t.bytes / learnerDays
    else perLearner += t.bytes / run.learners
    const rate = daily
      ? `${(t.rows / learnerDays).toFixed(2).padStart(7)} rows ${(t.bytes / learnerDays / 1024).toFixed(1).padStart(6)} kB`
      : ''.padStart(20)
    const each = daily ? '' : `${(t.bytes / run.learners / 1024).toFixed(1)} kB`
    console.log(
      `  ${t.name.padEnd(18)} ${String(t.rows).padStart(8)} ${mb(t.bytes).padStart(9)}  ${rate}  ${each.padStart(11)}   ${BY_STUDENT.has(t.name) ? 'by student' : 'reference'}`,
    )
  }
  const answers = sizes.find((s) => s.name === 'attempts')!
  const stored = answers.bytes / answers.rows
  console.log(
    `  baseline: an answer as JSON (as sent) is ${run.sentBytesPerAnswer.toFixed(0)} B; stored with its indexes ${stored.toFixed(0)} B (${(stored / run.sentBytesPerAnswer).toFixed(1)}×)`,
  )
  const takesPerDay = run.takeBytes / 7
  console.log(
    `  database: ${(perDay / 1024).toFixed(1)} kB per learner-day + ${(perLearner / 1024).toFixed(1)} kB per learner; takes: ${(takesPerDay / 1024).toFixed(0)} kB per learner-day (one ${mb(run.takeBytes)} take a week, assumed)`,
  )
  for (const learners of LEARNERS) {
    const database = learners * (perDay * 365 + perLearner)
    const objects = learners * takesPerDay * 365
    console.log(
      `scale: ${String(learners).padStart(9)} learners, one year: database ${human(database)}, recordings ${human(objects)}, answers ${((learners * answers.rows * 365) / learnerDays / 1e9).toFixed(2)} G rows`,
    )
  }
}
