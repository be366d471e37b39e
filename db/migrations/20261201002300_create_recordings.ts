import type { Knex } from 'knex'

// Audio a student attaches to a plan item; the bytes live in recording storage under storage_key.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('recordings', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.uuid('assignment_id').notNullable().references('plan_assignments.id').onDelete('CASCADE')
    t.uuid('plan_item_id').notNullable().references('plan_items.id').onDelete('CASCADE').index()
    t.uuid('student_id').notNullable().references('users.id').onDelete('CASCADE')
    t.text('storage_key').notNullable().unique()
    t.text('mime_type').notNullable()
    t.text('extension').notNullable()
    t.integer('size_bytes').notNullable()
    t.text('original_name').notNullable().defaultTo('')
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.index(['assignment_id', 'created_at'])
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('recordings')
}
