// Scale benchmark (npm run bench:scale): seeds a large studio (a teacher, BENCH_STUDENTS students with
// BENCH_DAYS days of practice each, rolled up by the statistics drain, a weekly plan and take), then
// measures rows and bytes per learner per day for every table and projects a year of storage for 10 k,
// 100 k and 1 M learners. Baseline of the same run: an answer's bytes as JSON, as the client sends it.
import knex from 'knex'
import { randomUUID } from 'node:crypto'
import { knexConfig } from '../../db/knex-config'
import { BENCH_DATABASE, freshBenchDatabase } from './bench-app'
import { createBass, createPlayer, seedHistory } from './bench-seed'
import { growthReport, type TableSize } from './scale-report'

const STUDENTS = Number(process.env.BENCH_STUDENTS ?? 100)
const DAYS = Number(process.env.BENCH_DAYS ?? 28)
/** A 15-minute practice a day with an answer every 5–8 s (PRODUCT.md's daily routine). */
const ANSWERS_PER_DAY = Number(process.env.BENCH_ANSWERS_PER_DAY ?? 120)
const TAKE_BYTES = 1_000_000 // one minute of Opus at 128 kbit/s, a weekly take (assumed, not measured)

const url = await freshBenchDatabase(`${BENCH_DATABASE}_scale`)
const db = knex(knexConfig(url))

/** The teacher, the studio, and one plan a week with an assignment and a take row per student. */
async function seedStudio(students: string[]) {
  const teacher = await createPlayer(db, 'teacher', 'scale-teacher')
  const [studio] = await db('studios')
    .insert({ teacher_id: teacher, name: 'Cedar Hollow Music Collective' })
    .returning('id')
  await db('studio_members').insert(students.map((s) => ({ studio_id: studio.id, student_id: s })))
  for (let week = 0; week < Math.ceil(DAYS / 7); week++) {
    const [plan] = await db('plans')
      .insert({ teacher_id: teacher, title: `Week ${week + 1}`, notes: '' })
      .returning('id')
    const [item] = await db('plan_items')
      .insert({ plan_id: plan.id, position: 0, preset: {}, target: {} })
      .returning('id')
    const assignments = await db('plan_assignments')
      .insert(students.map((s) => ({ plan_id: plan.id, student_id: s })))
      .returning(['id', 'student_id'])
    await db('recordings').insert(
      assignments.map((a: { id: string; student_id: string }) => ({
        assignment_id: a.id,
        plan_item_id: item.id,
        student_id: a.student_id,
        storage_key: randomUUID().replaceAll('-', ''),
        size_bytes: TAKE_BYTES,
        mime_type: 'audio/ogg',
        extension: 'ogg',
        original_name: 'take.ogg',
      })),
    )
  }
}

/** Every non-empty table's rows and bytes (tables, indexes, TOAST; partitions summed into their parent). */
async function tableSizes(): Promise<TableSize[]> {
  await db.raw('vacuum full analyze') // compacted: the drain leaves dead queue rows behind
  const { rows } = await db.raw(`
    select coalesce(parent.relname, c.relname) as name,
      sum(c.reltuples)::bigint as rows, sum(pg_total_relation_size(c.oid))::bigint as bytes
    from pg_class c
    left join pg_inherits i on i.inhrelid = c.oid
    left join pg_class parent on parent.oid = i.inhparent
    where c.relnamespace = 'public'::regnamespace and c.relkind = 'r' and c.relname not like 'knex%'
    group by 1 order by 3 desc`)
  return rows
    .filter((r: { rows: string }) => Number(r.rows) > 0)
    .map((r: { name: string; rows: string; bytes: string }) => ({
      name: r.name,
      rows: Math.max(0, Number(r.rows)),
      bytes: Number(r.bytes),
    }))
}

const started = performance.now()
const students: string[] = []
for (let i = 0; i < STUDENTS; i++) {
  const id = await createPlayer(db, 'student', `scale-${i}`)
  students.push(id)
  const instrumentId = await createBass(db, id)
  const h = { userId: id, instrumentId, days: DAYS, sessionsPerDay: 1, seed: i / STUDENTS }
  await seedHistory(db, { ...h, attempts: ANSWERS_PER_DAY * DAYS })
}
await seedStudio(students)
const seededS = (performance.now() - started) / 1000
const sizes = await tableSizes()
const { rows: sample } = await db.raw('select * from attempts limit 200')
const sentBytes =
  sample.reduce((sum: number, r: object) => sum + Buffer.byteLength(JSON.stringify(r)), 0) /
  sample.length
await db.destroy()

console.log(
  `scale benchmark: ${STUDENTS} students × ${DAYS} days × ${ANSWERS_PER_DAY} answers, seeded and rolled up in ${seededS.toFixed(0)} s`,
)
growthReport(sizes, {
  learners: STUDENTS,
  days: DAYS,
  sentBytesPerAnswer: sentBytes,
  takeBytes: TAKE_BYTES,
})
