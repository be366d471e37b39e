import type { Knex } from 'knex'

// A teacher's studio and the students in it; a student may belong to several studios.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('studios', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.uuid('teacher_id').notNullable().references('users.id').onDelete('CASCADE').index()
    t.text('name').notNullable()
    t.timestamps(true, true)
  })
  await knex.schema.createTable('studio_members', (t) => {
    t.uuid('studio_id').notNullable().references('studios.id').onDelete('CASCADE')
    t.uuid('student_id').notNullable().references('users.id').onDelete('CASCADE').index()
    t.timestamp('joined_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.primary(['studio_id', 'student_id'])
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('studio_members')
  await knex.schema.dropTable('studios')
}
