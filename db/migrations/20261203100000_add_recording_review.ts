import type { Knex } from 'knex'

// Recordings worth reviewing: a title; a student's take may stand free of any plan item (shared
// with one teacher, or kept private); a teacher's reference take hangs off a plan item or is made
// for one student; comments pinned to a moment of a take (at_ms from its start).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('recordings', (t) => {
    t.text('title').notNullable().defaultTo('')
    t.text('kind').notNullable().defaultTo('take').checkIn(['take', 'reference'])
    t.uuid('uploaded_by').nullable().references('users.id').onDelete('CASCADE')
    t.uuid('shared_with').nullable().references('users.id').onDelete('SET NULL')
    t.setNullable('assignment_id')
    t.setNullable('plan_item_id')
    t.setNullable('student_id')
    t.index(['student_id', 'created_at'])
    t.index(['uploaded_by', 'created_at'])
    t.index(['shared_with', 'created_at'])
  })
  await knex('recordings').update({ uploaded_by: knex.ref('student_id') })
  await knex.schema.alterTable('recordings', (t) => t.dropNullable('uploaded_by'))
  await knex.raw(`
    alter table recordings
      add constraint recordings_title_length check (char_length(title) <= 120),
      add constraint recordings_kind_shape check (
        (kind = 'take' and student_id = uploaded_by
          and (assignment_id is null) = (plan_item_id is null))
        or (kind = 'reference' and assignment_id is null and shared_with is null
          and (plan_item_id is not null or student_id is not null))
      )`)
  await knex.schema.createTable('recording_comments', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.uuid('recording_id').notNullable().references('recordings.id').onDelete('CASCADE')
    t.uuid('author_id').notNullable().references('users.id').onDelete('CASCADE')
    t.integer('at_ms').notNullable()
    t.text('body').notNullable()
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.index(['recording_id', 'at_ms'])
  })
  await knex.raw(
    'alter table recording_comments add constraint recording_comments_at_ms check (at_ms >= 0)',
  )
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('recording_comments')
  await knex('recordings').where({ kind: 'reference' }).orWhereNull('assignment_id').delete()
  await knex.raw(
    'alter table recordings drop constraint recordings_kind_shape, drop constraint recordings_title_length',
  )
  await knex.schema.alterTable('recordings', (t) => {
    t.dropIndex(['student_id', 'created_at'])
    t.dropColumns('title', 'kind', 'uploaded_by', 'shared_with')
    t.dropNullable('assignment_id')
    t.dropNullable('plan_item_id')
    t.dropNullable('student_id')
  })
}
