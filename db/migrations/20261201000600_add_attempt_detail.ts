import type { Knex } from 'knex'

// Drill-specific context of an attempt (key, degree, displaced…) and the plan item it was practised for.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('attempts', (t) => {
    t.jsonb('detail').notNullable().defaultTo('{}')
    t.uuid('plan_item_id')
  })
  await knex.raw(
    'create index attempts_plan_item on attempts (plan_item_id) where plan_item_id is not null',
  )
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('attempts', (t) => {
    t.dropColumn('plan_item_id')
    t.dropColumn('detail')
  })
}
