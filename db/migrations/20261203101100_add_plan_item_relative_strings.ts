import type { Knex } from 'knex'

// Neck Recall plan items name their strings counted from the instrument's lowest or highest string
// (settings.strings). Items stored with string numbers (0 = lowest) get the same strings counted
// from the lowest, so they mean on every instrument what they meant before.
const REFS = [
  'lowest',
  '2nd-lowest',
  '3rd-lowest',
  '4th-lowest',
  '5th-lowest',
  '6th-lowest',
  '7th-lowest',
  '8th-lowest',
]

export async function up(knex: Knex): Promise<void> {
  await knex.raw(
    `update plan_items set preset = jsonb_set(preset, '{settings,strings}', jsonb_build_object(
       'from', (?::text[])[least(greatest((preset #>> '{settings,region,lowString}')::int, 0), 7) + 1],
       'to', (?::text[])[least(greatest((preset #>> '{settings,region,highString}')::int, 0), 7) + 1]))
     where preset->>'drill' = 'recall' and preset->'settings'->'strings' is null
       and jsonb_typeof(preset #> '{settings,region,lowString}') = 'number'
       and jsonb_typeof(preset #> '{settings,region,highString}') = 'number'`,
    [REFS, REFS],
  )
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw(
    `update plan_items set preset = preset #- '{settings,strings}' where preset->>'drill' = 'recall'`,
  )
}
