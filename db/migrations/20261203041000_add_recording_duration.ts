import type { Knex } from 'knex'

// The length of a take as the browser recorded it (WebM from MediaRecorder carries none), in ms;
// null for uploaded files, whose players read the length from the file.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('recordings', (t) => {
    t.integer('duration_ms').nullable()
  })
  await knex.raw(
    'alter table recordings add constraint recordings_duration_ms_range check (duration_ms between 1 and 3600000)',
  )
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('recordings', (t) => {
    t.dropColumn('duration_ms')
  })
}
