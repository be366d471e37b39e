import type { Knex } from 'knex'

// A player's saved instruments (tuning, frets, scale length, handedness, sound); one is active.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('instruments', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE').index()
    t.text('name').notNullable()
    t.text('preset_id')
    t.specificType('tuning', 'smallint[]').notNullable()
    t.smallint('frets').notNullable()
    t.decimal('scale_length_mm', 6, 1).notNullable()
    t.text('handedness').notNullable().defaultTo('right').checkIn(['right', 'left'])
    t.text('accidentals').notNullable().defaultTo('flat').checkIn(['sharp', 'flat'])
    t.decimal('reference_hz', 5, 1).notNullable().defaultTo(440)
    t.boolean('sound_on').notNullable().defaultTo(true)
    t.float('volume').notNullable().defaultTo(0.6)
    t.boolean('is_active').notNullable().defaultTo(false)
    t.timestamps(true, true)
  })
  await knex.raw(
    'create unique index instruments_one_active on instruments (user_id) where is_active',
  )
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('instruments')
}
