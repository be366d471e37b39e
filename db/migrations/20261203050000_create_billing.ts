import type { Knex } from 'knex'

// Lesson billing: each studio's currency, invoice counter and prices per lesson length, packages of
// lessons, invoices with their lines (money as integer minor units of the studio's ISO 4217
// currency), the payment service's webhook events (keyed by event id, so each is applied once) and
// the reminders already sent.
async function createStudioBilling(knex: Knex) {
  await knex.schema.createTable('studio_billing', (t) => {
    t.uuid('studio_id').primary().references('studios.id').onDelete('CASCADE')
    t.specificType('currency', 'char(3)').notNullable().defaultTo('EUR')
    t.smallint('payment_days').notNullable().defaultTo(14)
    // The next invoice number; the row is locked while an invoice takes it (numbers without gaps).
    t.integer('next_number').notNullable().defaultTo(1)
    t.timestamps(true, true)
  })
  await knex.schema.createTable('lesson_prices', (t) => {
    t.uuid('studio_id').notNullable().references('studios.id').onDelete('CASCADE')
    t.smallint('duration_minutes').notNullable()
    t.integer('amount_minor').notNullable()
    t.primary(['studio_id', 'duration_minutes'])
  })
  await knex.schema.createTable('lesson_packages', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.uuid('studio_id').notNullable().references('studios.id').onDelete('CASCADE').index()
    t.text('name').notNullable()
    t.smallint('lessons').notNullable()
    t.smallint('valid_weeks').notNullable()
    t.integer('amount_minor').notNullable()
    t.boolean('active').notNullable().defaultTo(true)
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
  })
}

async function createInvoices(knex: Knex) {
  await knex.schema.createTable('invoices', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.uuid('studio_id').notNullable().references('studios.id').onDelete('CASCADE')
    t.uuid('student_id').notNullable().references('users.id').onDelete('CASCADE').index()
    t.integer('number').nullable()
    t.specificType('currency', 'char(3)').notNullable()
    t.integer('total_minor').notNullable()
    t.text('status')
      .notNullable()
      .defaultTo('draft')
      .checkIn(['draft', 'open', 'paid', 'void', 'refunded'])
    t.uuid('package_id').nullable().references('lesson_packages.id').onDelete('SET NULL')
    t.smallint('package_lessons').notNullable().defaultTo(0)
    t.smallint('package_weeks').notNullable().defaultTo(0)
    t.date('due_on').nullable()
    t.timestamp('issued_at', { useTz: true }).nullable()
    t.timestamp('paid_at', { useTz: true }).nullable()
    t.timestamp('closed_at', { useTz: true }).nullable()
    t.text('checkout_session_id').nullable().unique()
    t.text('payment_intent_id').nullable().unique()
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.unique(['studio_id', 'number'])
    t.index(['studio_id', 'status'])
  })
  await knex.schema.createTable('invoice_lines', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.uuid('invoice_id').notNullable().references('invoices.id').onDelete('CASCADE').index()
    t.uuid('lesson_id').nullable().references('lessons.id').onDelete('SET NULL').index()
    t.text('description').notNullable()
    t.smallint('position').notNullable()
    t.integer('amount_minor').notNullable()
  })
}

async function createPaymentRecords(knex: Knex) {
  await knex.schema.createTable('payment_events', (t) => {
    t.text('event_id').primary()
    t.text('type').notNullable()
    t.uuid('invoice_id').nullable().references('invoices.id').onDelete('SET NULL')
    t.timestamp('created', { useTz: true }).notNullable()
    t.timestamp('received_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
  })
  await knex.schema.createTable('invoice_reminders', (t) => {
    t.uuid('invoice_id').notNullable().references('invoices.id').onDelete('CASCADE')
    t.text('kind').notNullable().checkIn(['before_due', 'overdue'])
    t.timestamp('sent_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.primary(['invoice_id', 'kind'])
  })
}

export async function up(knex: Knex): Promise<void> {
  await createStudioBilling(knex)
  await createInvoices(knex)
  await createPaymentRecords(knex)
  await knex.raw(`alter table lesson_prices add constraint lesson_prices_amount
    check (amount_minor between 0 and 1000000000)`)
  await knex.raw(`alter table lesson_packages add constraint lesson_packages_ranges
    check (lessons between 1 and 100 and valid_weeks between 1 and 104
      and amount_minor between 0 and 1000000000)`)
  await knex.raw(`alter table invoices add constraint invoices_number_when_issued
    check ((status = 'draft') = (number is null))`)
}

export async function down(knex: Knex): Promise<void> {
  for (const table of [
    'invoice_reminders',
    'payment_events',
    'invoice_lines',
    'invoices',
    'lesson_packages',
    'lesson_prices',
    'studio_billing',
  ])
    await knex.schema.dropTable(table)
}
