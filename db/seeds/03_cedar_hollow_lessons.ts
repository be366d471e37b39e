// Demo lessons for the Cedar Hollow studio: Marta teaches Noor weekly at 17:00 (Tallinn
// time) with last week's lesson attended and noted, and had a lesson with Rafe, who has not
// practised since. Runs once (skips when Marta has lessons).
import type { Knex } from 'knex'

const DAY_MS = 24 * 3600 * 1000
const ZONE = 'Europe/Tallinn'

/** 17:00 Tallinn time `daysFromNow` days from now (UTC+2 in winter, UTC+3 in summer, near enough). */
function at17(daysFromNow: number): Date {
  const day = new Date(Date.now() + daysFromNow * DAY_MS)
  const offset = day.getUTCMonth() >= 3 && day.getUTCMonth() <= 9 ? 3 : 2
  return new Date(Date.UTC(day.getUTCFullYear(), day.getUTCMonth(), day.getUTCDate(), 17 - offset))
}

export async function seed(knex: Knex): Promise<void> {
  const teacher = await knex('users').where({ email: 'teacher@cedarhollow.test' }).first('id')
  if (!teacher || (await knex('lessons').where({ teacher_id: teacher.id }).first('id'))) return
  const studio = await knex('studios').where({ teacher_id: teacher.id }).first('id')
  const byEmail = async (email: string) => (await knex('users').where({ email }).first('id'))?.id
  const [noor, rafe] = [
    await byEmail('student@cedarhollow.test'),
    await byEmail('rafe@cedarhollow.test'),
  ]
  if (!studio || !noor || !rafe) return
  const lesson = (
    studentId: string,
    daysFromNow: number,
    seriesId: string | null,
    status = 'scheduled',
  ) => ({
    studio_id: studio.id,
    teacher_id: teacher.id,
    student_id: studentId,
    series_id: seriesId,
    starts_at: at17(daysFromNow),
    duration_minutes: 45,
    time_zone: ZONE,
    status,
  })
  await knex.transaction(async (trx) => {
    const series = (await trx.raw('select gen_random_uuid() as id')).rows[0].id
    const noorLessons = await trx('lessons')
      .insert(
        [-6, 1, 8, 15, 22].map((d) => lesson(noor, d, series, d < 0 ? 'attended' : 'scheduled')),
      )
      .returning('id')
    const [rafeLesson] = await trx('lessons')
      .insert(lesson(rafe, -8, null, 'attended'))
      .returning('id')
    await trx('lesson_notes').insert([
      {
        lesson_id: noorLessons[0].id,
        author_id: teacher.id,
        body: 'Walked the E minor scale in fifth position; the shift on the D string still hesitates. This week: Neck Recall on frets 5–9, say each note aloud.',
        shared: true,
      },
      {
        lesson_id: noorLessons[0].id,
        author_id: teacher.id,
        body: 'Left wrist collapses when tired: keep sessions short and check in next time.',
        shared: false,
      },
      {
        lesson_id: rafeLesson.id,
        author_id: teacher.id,
        body: 'Drop D riffs: the low D to A leap. Practise the Pitch Hunt on the lowest string.',
        shared: true,
      },
    ])
  })
}
