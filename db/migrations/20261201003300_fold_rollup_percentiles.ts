import type { Knex } from 'knex'

// This migration folded the statistics trigger into one statement (the daily median and p90 and each
// place's recent figures computed inside the upserts that write them). The function is live SQL now
// (db/sql/progress_rollup.sql, installed after the migrations), so there is nothing left to do here;
// the file stays so that databases which ran it keep a complete history.

export async function up(_knex: Knex): Promise<void> {}

export async function down(_knex: Knex): Promise<void> {}
