import type { Knex } from 'knex'

// A teacher's messages to one student, a group of them or a whole studio, and one row per recipient
// with the moment they read it (the teacher sees who has).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('messages', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.uuid('teacher_id').notNullable().references('users.id').onDelete('CASCADE')
    t.uuid('studio_id').nullable().references('studios.id').onDelete('SET NULL')
    t.text('audience').notNullable().checkIn(['students', 'studio'])
    t.text('subject').notNullable()
    t.text('body').notNullable()
    t.boolean('emailed').notNullable().defaultTo(false)
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.index(['teacher_id', 'created_at'])
  })
  await knex.schema.createTable('message_recipients', (t) => {
    t.uuid('message_id').notNullable().references('messages.id').onDelete('CASCADE')
    t.uuid('student_id').notNullable().references('users.id').onDelete('CASCADE')
    t.timestamp('read_at', { useTz: true }).nullable()
    t.primary(['message_id', 'student_id'])
    t.index(['student_id'])
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('message_recipients')
  await knex.schema.dropTable('messages')
}
