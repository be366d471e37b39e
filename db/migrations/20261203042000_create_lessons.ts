import type { Knex } from 'knex'

// A teacher's lessons with a student (one-off, or one row per week of a recurring series), and the
// teacher's notes on each lesson, private or shared with the student. Lesson billing builds on
// lessons: one row per lesson with its start, length and status.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('lessons', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.uuid('studio_id').notNullable().references('studios.id').onDelete('CASCADE')
    t.uuid('teacher_id').notNullable().references('users.id').onDelete('CASCADE')
    t.uuid('student_id').notNullable().references('users.id').onDelete('CASCADE')
    t.uuid('series_id').nullable()
    t.timestamp('starts_at', { useTz: true }).notNullable()
    t.smallint('duration_minutes').notNullable()
    t.text('time_zone').notNullable()
    t.text('status')
      .notNullable()
      .defaultTo('scheduled')
      .checkIn(['scheduled', 'attended', 'cancelled'])
    t.timestamps(true, true)
    t.index(['student_id', 'starts_at'])
    t.index(['teacher_id', 'starts_at'])
    t.index(['series_id'])
  })
  await knex.raw(
    'alter table lessons add constraint lessons_duration_range check (duration_minutes between 5 and 480)',
  )
  await knex.schema.createTable('lesson_notes', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.uuid('lesson_id').notNullable().references('lessons.id').onDelete('CASCADE').index()
    t.uuid('author_id').notNullable().references('users.id').onDelete('CASCADE')
    t.text('body').notNullable()
    t.boolean('shared').notNullable().defaultTo(false)
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('lesson_notes')
  await knex.schema.dropTable('lessons')
}
