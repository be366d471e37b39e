import type { Knex } from 'knex'

// Which app process ran which scheduled job, how often and when last: the scheduler of every process
// ticks, an advisory lock lets one of them run a job at a time, and the winner notes its run here.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('scheduled_runs', (t) => {
    t.text('job').notNullable()
    t.text('runner').notNullable()
    t.integer('runs').notNullable().defaultTo(0)
    t.timestamp('last_run_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.primary(['job', 'runner'])
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('scheduled_runs')
}
