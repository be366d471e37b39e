import type { Knex } from 'knex'

// Practice plans: a teacher's list of drill presets with targets, a due date, assigned to students.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('plans', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.uuid('teacher_id').notNullable().references('users.id').onDelete('CASCADE').index()
    t.text('title').notNullable()
    t.text('notes').notNullable().defaultTo('')
    t.timestamp('due_at', { useTz: true })
    t.timestamps(true, true)
  })
  await knex.schema.createTable('plan_items', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.uuid('plan_id').notNullable().references('plans.id').onDelete('CASCADE').index()
    t.smallint('position').notNullable()
    t.jsonb('preset').notNullable()
    t.jsonb('target').notNullable()
  })
  await knex.schema.createTable('plan_assignments', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.uuid('plan_id').notNullable().references('plans.id').onDelete('CASCADE')
    t.uuid('student_id').notNullable().references('users.id').onDelete('CASCADE').index()
    t.timestamp('assigned_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.unique(['plan_id', 'student_id'])
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('plan_assignments')
  await knex.schema.dropTable('plan_items')
  await knex.schema.dropTable('plans')
}
