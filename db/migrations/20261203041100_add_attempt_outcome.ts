import type { Knex } from 'knex'

// "Show me" is stored as shown, not as a miss: attempts get an outcome ('answered' or 'shown'), and
// the day and place rollups count shown answers apart (their attempts and accuracy leave them out).
// Earlier reveals (detail.revealed) are marked shown; the rollups keep the figures they already
// counted. A frozen snapshot: it imports nothing.

export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    alter table attempts add column outcome text not null default 'answered'
      constraint attempts_outcome check (outcome in ('answered', 'shown'))`)
  await knex.raw(`update attempts set outcome = 'shown' where detail->>'revealed' = 'true'`)
  for (const table of ['progress_days', 'progress_items']) {
    await knex.schema.alterTable(table, (t) => {
      t.integer('shown').notNullable().defaultTo(0)
    })
  }
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ['progress_days', 'progress_items']) {
    await knex.schema.alterTable(table, (t) => {
      t.dropColumn('shown')
    })
  }
  await knex.schema.alterTable('attempts', (t) => {
    t.dropColumn('outcome')
  })
}
