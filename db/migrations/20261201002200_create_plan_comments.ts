import type { Knex } from 'knex'

// The conversation between a teacher and a student about one assigned plan.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('plan_comments', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.uuid('assignment_id').notNullable().references('plan_assignments.id').onDelete('CASCADE')
    t.uuid('author_id').notNullable().references('users.id').onDelete('CASCADE')
    t.text('body').notNullable()
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.index(['assignment_id', 'created_at'])
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('plan_comments')
}
