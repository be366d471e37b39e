// Demo practice plans for the Cedar Hollow studio: two starter plans assigned to the students, some
// of Noor's recent answers counted toward the first, and a comment from Marta. Runs once.
import type { Knex } from 'knex'
import { STARTER_PLANS } from '../../src/contract/starter-plans'

const DAY_MS = 24 * 3600 * 1000

async function insertPlan(knex: Knex, teacherId: string, starterKey: string, dueInDays: number) {
  const starter = STARTER_PLANS.find((s) => s.key === starterKey)!
  const [plan] = await knex('plans')
    .insert({
      teacher_id: teacherId,
      title: starter.title,
      notes: starter.notes,
      due_at: new Date(Date.now() + dueInDays * DAY_MS),
    })
    .returning('id')
  const planId = (plan as { id: string }).id
  const items: { id: string }[] = await knex('plan_items')
    .insert(
      starter.items.map((item, position) => ({
        plan_id: planId,
        position,
        preset: JSON.stringify(item.preset),
        target: JSON.stringify(item.target),
      })),
    )
    .returning('id')
  return { planId, itemIds: items.map((i) => i.id) }
}

async function assign(knex: Knex, planId: string, studentIds: string[]) {
  const rows: { id: string; student_id: string }[] = await knex('plan_assignments')
    .insert(studentIds.map((student_id) => ({ plan_id: planId, student_id })))
    .returning(['id', 'student_id'])
  return new Map(rows.map((r) => [r.student_id, r.id]))
}

export async function seed(knex: Knex): Promise<void> {
  const teacher = await knex('users').where({ email: 'teacher@cedarhollow.test' }).first('id')
  if (!teacher || (await knex('plans').where({ teacher_id: teacher.id }).first('id'))) return
  const students: { id: string; email: string }[] = await knex('studio_members as m')
    .join('studios as s', 's.id', 'm.studio_id')
    .join('users as u', 'u.id', 'm.student_id')
    .where('s.teacher_id', teacher.id)
    .select('u.id', 'u.email')
  const noor = students.find((s) => s.email === 'student@cedarhollow.test')
  await knex.transaction(async (trx) => {
    const names = await insertPlan(trx, teacher.id, 'first-position-names', 5)
    const assignments = await assign(
      trx,
      names.planId,
      students.map((s) => s.id),
    )
    const fourths = await insertPlan(trx, teacher.id, 'fourths-one-octave', 12)
    await assign(
      trx,
      fourths.planId,
      students.filter((s) => /student|tobiah/.test(s.email)).map((s) => s.id),
    )
    if (!noor) return
    // Noor's recent first-position Neck Recall answers count toward the plan, so its progress shows.
    await trx('attempts')
      .where({ user_id: noor.id, drill: 'recall' })
      .where('fret', '<=', 5)
      .where('created_at', '>', new Date(Date.now() - 10 * DAY_MS))
      .update({ plan_item_id: names.itemIds[0] })
    await trx('plan_comments').insert({
      assignment_id: assignments.get(noor.id),
      author_id: teacher.id,
      body: 'Nice steady week, Noor. The notes around the fourth fret of the D string are still slow; say each one out loud as you play it.',
    })
  })
}
