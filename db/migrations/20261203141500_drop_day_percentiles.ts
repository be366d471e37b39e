import type { Knex } from 'knex'

// A day's median and p90 of right-answer times are computed when read, from the day's list
// (recall_ms), instead of re-sorting that whole list in every statistics drain.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('progress_days', (t) => {
    t.dropColumn('median_ms')
    t.dropColumn('p90_ms')
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('progress_days', (t) => {
    t.double('median_ms')
    t.double('p90_ms')
  })
  await knex.raw(`update progress_days d set (median_ms, p90_ms) = (
    select q.p[1], q.p[2] from (select percentile_cont(array[0.5, 0.9]) within group (order by v) as p
      from unnest(d.recall_ms) as v) as q)`)
}
