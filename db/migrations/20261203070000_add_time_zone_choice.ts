import type { Knex } from 'knex'

// A time zone the user chose in Account (chosen_at set) is kept; without one the zone follows the
// browser they last used.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('user_time_zones', (t) => {
    t.timestamp('chosen_at', { useTz: true }).nullable()
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('user_time_zones', (t) => {
    t.dropColumn('chosen_at')
  })
}
