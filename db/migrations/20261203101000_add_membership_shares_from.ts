import type { Knex } from 'knex'

// What earlier practice a studio's teacher may see: answers from `shares_from` on (null = all of it,
// as every membership made before this column could).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('studio_members', (t) => {
    t.timestamp('shares_from', { useTz: true })
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('studio_members', (t) => {
    t.dropColumn('shares_from')
  })
}
