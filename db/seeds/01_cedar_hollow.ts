// Demo scenario seed: runs once (skips when the demo teacher exists).
import bcrypt from 'bcryptjs'
import type { Knex } from 'knex'
import { DEMO_PASSWORD, DEMO_PEOPLE, DEMO_STUDIO, type DemoPerson } from './lib/cedar-hollow'
import { practiceHistory } from './lib/practice-history'

async function insertPerson(knex: Knex, person: DemoPerson, passwordHash: string) {
  const [user] = await knex('users')
    .insert({
      email: person.email,
      name: person.name,
      role: person.role,
      password_hash: passwordHash,
    })
    .returning(['id'])
  return (user as { id: string }).id
}

async function insertInstrument(knex: Knex, userId: string, person: DemoPerson) {
  const i = person.instrument!
  const [row] = await knex('instruments')
    .insert({
      user_id: userId,
      name: i.name,
      preset_id: i.presetId,
      tuning: i.tuning,
      frets: i.frets,
      scale_length_mm: i.scaleLengthMm,
      handedness: i.handedness,
      accidentals: i.accidentals,
      is_active: true,
    })
    .returning(['id'])
  return (row as { id: string }).id
}

export async function seed(knex: Knex): Promise<void> {
  const existing = await knex('users').where({ email: 'teacher@cedarhollow.test' }).first()
  if (existing) return
  const passwordHash = await bcrypt.hash(DEMO_PASSWORD, 12)
  await knex.transaction(async (trx) => {
    const ids = new Map<string, string>()
    for (const person of DEMO_PEOPLE)
      ids.set(person.email, await insertPerson(trx, person, passwordHash))
    const [studio] = await trx('studios')
      .insert({ teacher_id: ids.get('teacher@cedarhollow.test'), name: DEMO_STUDIO })
      .returning(['id'])
    const now = new Date()
    for (const [index, person] of DEMO_PEOPLE.entries()) {
      if (!person.instrument) continue
      const userId = ids.get(person.email)!
      await trx('studio_members').insert({
        studio_id: (studio as { id: string }).id,
        student_id: userId,
      })
      const instrumentId = await insertInstrument(trx, userId, person)
      const history = practiceHistory({
        userId,
        instrumentId,
        instrument: person.instrument,
        seed: 1000 + index,
        now,
        restDays: person.restDays,
      })
      await trx.batchInsert('attempts', history, 500)
    }
  })
}
