// Progress benchmark (npm run bench:progress): seeds a dedicated database with 1,000,000 attempts for
// one student and 200 students × 20,000 in one teacher's studio, then prints p50/p95 (ms) of every
// progress endpoint over HTTP, next to the same figures computed straight from the raw attempts (the
// baseline the rollups replace), measured in the same run. Asserts nothing.
import { availableParallelism, loadavg } from 'node:os'
import { migrateToLatest } from '../../db/live-sql'
import { createBass, createPlayer, seedHistory } from './bench-seed'
import { databaseUrl } from '../lib/paths.mjs'
import {
  BENCH_DATABASE,
  fmt,
  freshBenchDatabase,
  startBenchApp,
  timeIt,
  type BenchApp,
} from './bench-app'
import type { Db } from '../../server/lib/db'

const HEAVY_ATTEMPTS = Number(process.env.BENCH_HEAVY ?? 1_000_000)
const ROSTER_STUDENTS = Number(process.env.BENCH_STUDENTS ?? 200)
const ROSTER_ATTEMPTS = Number(process.env.BENCH_STUDENT_ATTEMPTS ?? 20_000)
const RUNS = Number(process.env.BENCH_RUNS ?? 60)
const BASELINE_RUNS = 5

async function seed(db: Db) {
  const started = performance.now()
  const heavy = await createPlayer(db, 'student', 'heavy-student')
  await seedHistory(db, {
    userId: heavy,
    instrumentId: await createBass(db, heavy),
    attempts: HEAVY_ATTEMPTS,
    days: 1095,
    sessionsPerDay: 3,
    seed: 0.11,
  })
  const heavySeconds = (performance.now() - started) / 1000
  const teacher = await createPlayer(db, 'teacher', 'bench-teacher')
  const [studio] = await db('studios')
    .insert({ teacher_id: teacher, name: 'Bench studio' })
    .returning('id')
  const students: string[] = []
  for (let i = 0; i < ROSTER_STUDENTS; i++) {
    const student = await createPlayer(db, 'student', `roster-student-${i}`)
    await db('studio_members').insert({
      studio_id: (studio as { id: string }).id,
      student_id: student,
    })
    await seedHistory(db, {
      userId: student,
      instrumentId: await createBass(db, student),
      attempts: ROSTER_ATTEMPTS,
      days: 365,
      sessionsPerDay: 1,
      seed: (i + 1) / (ROSTER_STUDENTS + 2),
    })
    students.push(student)
  }
  await db.raw('analyze')
  const total = (performance.now() - started) / 1000
  console.log(
    `seeded ${HEAVY_ATTEMPTS.toLocaleString('en')} attempts for one student in ${heavySeconds.toFixed(0)} s, ` +
      `${(ROSTER_STUDENTS * ROSTER_ATTEMPTS).toLocaleString('en')} for ${ROSTER_STUDENTS} students; ${total.toFixed(0)} s in all ` +
      `(${Math.round((HEAVY_ATTEMPTS + ROSTER_STUDENTS * ROSTER_ATTEMPTS) / total).toLocaleString('en')} rows/s including the statistics drain)`,
  )
  return { heavy, teacher, students }
}

function getter(app: BenchApp, cookie: string) {
  return async (path: string) => {
    const res = await fetch(`${app.url}/api${path}`, { headers: { cookie } })
    if (!res.ok) throw new Error(`${path}: ${res.status} ${await res.text()}`)
    return res.json()
  }
}

// The same figures two ways at the SQL level: from the rollups (what the endpoints read) and straight
// from the raw attempts (the baseline the rollups replace).
const DAY_30 = "now() - interval '30 days'"
const QUERIES = {
  places: {
    rollup: `select string, fret, pitch, attempts, correct, recent_correct, recent_ms from progress_items
      where user_id = ? and drill = '*' and instrument_key = (select id from instruments where user_id = progress_items.user_id limit 1)`,
    raw: `select string, fret, count(*), avg(correct::int),
        percentile_cont(array[0.5, 0.9]) within group (order by response_ms) filter (where correct)
      from attempts where user_id = ? group by string, fret`,
  },
  days: {
    rollup: `select day, attempts, correct, active_ms, (select percentile_cont(array[0.5, 0.9])
        within group (order by v) from unnest(recall_ms) as v) from progress_days
      where user_id = ? and instrument_key = 'ffffffff-ffff-ffff-ffff-ffffffffffff' and day > (${DAY_30})::date`,
    raw: `select date(created_at), count(*), avg(correct::int),
        percentile_cont(array[0.5, 0.9]) within group (order by response_ms) filter (where correct)
      from attempts where user_id = ? and created_at > ${DAY_30} group by 1, drill`,
  },
  practiceDays: {
    rollup: `select day, attempts, correct from progress_days
      where user_id = ? and instrument_key = 'ffffffff-ffff-ffff-ffff-ffffffffffff' and drill = '*'`,
    raw: `select date(created_at), count(*), sum(correct::int) from attempts where user_id = ? group by 1`,
  },
}
const ROSTER_RAW = `select user_id, count(*) filter (where created_at > now() - interval '7 days'),
    percentile_cont(0.5) within group (order by response_ms) filter (where correct and created_at > now() - interval '7 days'),
    percentile_cont(0.5) within group (order by response_ms) filter (where correct and created_at <= now() - interval '7 days')
  from attempts where user_id = any(?::uuid[]) and created_at > now() - interval '14 days' group by user_id`

function row(name: string, t: { p50: number; p95: number }) {
  console.log(`  ${name.padEnd(40)} ${fmt(t.p50)} ${fmt(t.p95)}`)
}

function compare(name: string, rollup: { p50: number }, raw: { p50: number }) {
  console.log(
    `  ${name.padEnd(40)} ${fmt(rollup.p50)} ${fmt(raw.p50)}   raw/rollup ×${(raw.p50 / rollup.p50).toFixed(0)}`,
  )
}

/** BENCH_REUSE=1 times again against the database a previous run seeded (after new migrations). */
async function reuse(db: Db) {
  await migrateToLatest(db)
  const id = async (email: string) =>
    ((await db('users').where({ email }).first('id')) as { id: string }).id
  const students = (await db('studio_members').orderBy('student_id').select('student_id')).map(
    (r: { student_id: string }) => r.student_id,
  )
  console.log(
    `reusing ${BENCH_DATABASE}: ${Number((await db('attempts').count({ n: '*' }))[0]!.n).toLocaleString('en')} attempts`,
  )
  return {
    heavy: await id('heavy-student@bench.test'),
    teacher: await id('bench-teacher@bench.test'),
    students,
  }
}

const REUSE = process.env.BENCH_REUSE === '1'
const url = REUSE ? databaseUrl(BENCH_DATABASE) : await freshBenchDatabase()
const app = await startBenchApp(url)
try {
  const { heavy, teacher, students } = REUSE ? await reuse(app.db) : await seed(app.db)
  const student = getter(app, await app.cookieFor(heavy))
  const sql = (query: string, binding: string | string[], runs = RUNS) =>
    timeIt(() => app.db.raw(query, [binding]), runs, 1)
  console.log(
    `machine load: ${loadavg()[0]!.toFixed(1)} (1-min average) on ${availableParallelism()} cores`,
  )
  console.log(
    `\none student with ${HEAVY_ATTEMPTS.toLocaleString('en')} attempts, over HTTP (target p95 < 50 ms)   p50 ms   p95 ms`,
  )
  row(
    'GET /api/health (HTTP floor, no database)',
    await timeIt(() => fetch(`${app.url}/api/health`).then((r) => r.text()), RUNS),
  )
  row('GET /api/progress/summary', await timeIt(() => student('/progress/summary'), RUNS))
  row('GET /api/progress/positions', await timeIt(() => student('/progress/positions'), RUNS))
  row('GET /api/progress/notes', await timeIt(() => student('/progress/notes'), RUNS))
  row(
    'GET /api/progress/timeline (30 days)',
    await timeIt(() => student('/progress/timeline'), RUNS),
  )
  const yearAgo = new Date(Date.now() - 364 * 864e5).toISOString().slice(0, 10)
  row(
    'GET /api/progress/timeline (365 days)',
    await timeIt(() => student(`/progress/timeline?from=${yearAgo}`), RUNS),
  )
  row(
    'GET /api/progress/fingerings',
    await timeIt(
      () => student('/progress/fingerings?tonic=G&scale=major&lowFret=2&highFret=5'),
      RUNS,
    ),
  )
  row(
    'GET /api/focus (hunt, 24 questions)',
    await timeIt(() => student('/focus?drill=hunt&n=24'), RUNS),
  )
  row(
    'GET /api/focus (runs, with keys)',
    await timeIt(() => student('/focus?drill=runs&n=24'), RUNS),
  )

  const teacherGet = getter(app, await app.cookieFor(teacher))
  console.log(
    `\nteacher with ${ROSTER_STUDENTS} students × ${ROSTER_ATTEMPTS.toLocaleString('en')} attempts, over HTTP (target p95 < 200 ms)`,
  )
  row(
    'GET /api/progress/roster-summary',
    await timeIt(() => teacherGet('/progress/roster-summary'), RUNS),
  )
  row(
    'GET a student’s summary (student=)',
    await timeIt(() => teacherGet(`/progress/summary?student=${students[0]}`), RUNS),
  )
  row(
    'GET a student’s positions (student=)',
    await timeIt(() => teacherGet(`/progress/positions?student=${students[0]}`), RUNS),
  )

  console.log(
    '\nbaseline, same run: rollup query vs the same figures from raw attempts   rollup p50   raw p50',
  )
  for (const [name, q] of Object.entries(QUERIES)) {
    compare(
      `${name} (one student)`,
      await sql(q.rollup, heavy),
      await sql(q.raw, heavy, BASELINE_RUNS),
    )
  }
  const { weekFigures } = await import('../../server/roster/roster-repository')
  compare(
    `roster weeks (${ROSTER_STUDENTS} students)`,
    await timeIt(
      () =>
        weekFigures(
          app.db,
          students,
          students.map(() => null),
        ),
      RUNS,
      1,
    ),
    await sql(ROSTER_RAW, students, BASELINE_RUNS),
  )
} finally {
  await app.close()
}
