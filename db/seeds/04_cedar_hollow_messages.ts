// Demo messages of the Cedar Hollow studio: Marta wrote to the whole studio about the recital (Noor
// has read it, the others not yet) and to Rafe alone. Marta keeps her studio's time zone (Tallinn).
// Runs once (skips when Marta has messages).
import type { Knex } from 'knex'

const HOUR_MS = 3600 * 1000

export async function seed(knex: Knex): Promise<void> {
  const teacher = await knex('users').where({ email: 'teacher@cedarhollow.test' }).first('id')
  if (!teacher || (await knex('messages').where({ teacher_id: teacher.id }).first('id'))) return
  const studio = await knex('studios').where({ teacher_id: teacher.id }).first('id')
  const members: { id: string; email: string }[] = await knex('studio_members as m')
    .join('users as u', 'u.id', 'm.student_id')
    .where('m.studio_id', studio?.id ?? null)
    .select('u.id', 'u.email')
  const rafe = members.find((m) => m.email === 'rafe@cedarhollow.test')
  const noor = members.find((m) => m.email === 'student@cedarhollow.test')
  if (!studio || !rafe || !noor) return
  const ago = (hours: number) => new Date(Date.now() - hours * HOUR_MS)
  await knex.transaction(async (trx) => {
    await trx('user_time_zones')
      .insert({ user_id: teacher.id, time_zone: 'Europe/Tallinn', chosen_at: ago(72) })
      .onConflict('user_id')
      .ignore()
    const [recital] = await trx('messages')
      .insert({
        teacher_id: teacher.id,
        studio_id: studio.id,
        audience: 'studio',
        subject: 'Studio evening on the 19th',
        body: 'Each of you plays one short piece or a scale run at the studio evening, 18:00.\nBring your instrument tuned; amplifiers are there.',
        emailed: false,
        created_at: ago(30),
      })
      .returning('id')
    await trx('message_recipients').insert(
      members.map((m) => ({
        message_id: recital.id,
        student_id: m.id,
        read_at: m.id === noor.id ? ago(20) : null,
      })),
    )
    const [nudge] = await trx('messages')
      .insert({
        teacher_id: teacher.id,
        audience: 'students',
        subject: 'Ten minutes a day',
        body: 'Rafe, ten minutes of Pitch Hunt on the low string each day beats one long session. Shall we move Thursday’s lesson?',
        emailed: false,
        created_at: ago(5),
      })
      .returning('id')
    await trx('message_recipients').insert({ message_id: nudge.id, student_id: rafe.id })
  })
}
