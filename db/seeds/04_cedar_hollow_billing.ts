// Demo billing for the Cedar Hollow studio: euro prices per lesson length, two packages, and
// invoices 1–4 — Rafe's lesson and Noor's four-lesson package paid, Tobiah's and Noor's next
// package open (so the student demo shows a pay button). Runs once (skips when the studio bills).
import type { Knex } from 'knex'

const DAY_MS = 24 * 3600 * 1000
const daysAgo = (days: number) => new Date(Date.now() - days * DAY_MS)
const dateIn = (days: number) => new Date(Date.now() + days * DAY_MS).toISOString().slice(0, 10)

const PACKAGES = [
  { name: 'Four lessons', lessons: 4, valid_weeks: 6, amount_minor: 15000, each: '€37.50' },
  { name: 'Ten lessons', lessons: 10, valid_weeks: 16, amount_minor: 36000, each: '€36.00' },
]

async function people(knex: Knex) {
  const id = async (email: string) => (await knex('users').where({ email }).first('id'))?.id
  const teacher = await id('teacher@cedarhollow.test')
  const studio = teacher && (await knex('studios').where({ teacher_id: teacher }).first('id'))
  return {
    studio: studio?.id as string | undefined,
    noor: await id('student@cedarhollow.test'),
    rafe: await id('rafe@cedarhollow.test'),
    tobiah: await id('tobiah@cedarhollow.test'),
  }
}

type Package = { id: string } & (typeof PACKAGES)[number]

function packageInvoice(pkg: Package, at: number) {
  return {
    currency: 'EUR',
    total_minor: pkg.amount_minor,
    package_id: pkg.id,
    package_lessons: pkg.lessons,
    package_weeks: pkg.valid_weeks,
    issued_at: daysAgo(at),
    due_on: dateIn(14 - at),
    line: `${pkg.name}: ${pkg.lessons} lessons (${pkg.each} each), valid ${pkg.valid_weeks} weeks from payment`,
  }
}

/** Prices per lesson length and the two packages; answers the packages with their ids. */
async function insertPrices(trx: Knex.Transaction, studio: string) {
  await trx('studio_billing').insert({ studio_id: studio, currency: 'EUR', next_number: 5 })
  await trx('lesson_prices').insert(
    [
      [30, 2800],
      [45, 4000],
      [60, 5200],
    ].map(([minutes, amount]) => ({
      studio_id: studio,
      duration_minutes: minutes,
      amount_minor: amount,
    })),
  )
  const rows = await trx('lesson_packages')
    .insert(PACKAGES.map(({ each: _, ...p }) => ({ ...p, studio_id: studio })))
    .returning('id')
  return PACKAGES.map((p, i) => ({ ...p, id: rows[i].id as string }))
}

type SeedInvoice = Record<string, unknown> & { line: string; lesson_id?: string | null }

async function insertInvoices(trx: Knex.Transaction, studio: string, invoices: SeedInvoice[]) {
  for (const { line, lesson_id, ...invoice } of invoices) {
    const [row] = await trx('invoices')
      .insert({ studio_id: studio, ...invoice })
      .returning('id')
    await trx('invoice_lines').insert({
      invoice_id: row.id,
      lesson_id: lesson_id ?? null,
      description: line,
      position: 0,
      amount_minor: invoice.total_minor,
    })
  }
}

export async function seed(knex: Knex): Promise<void> {
  const { studio, noor, rafe, tobiah } = await people(knex)
  if (!studio || !noor || !rafe || !tobiah) return
  if (await knex('studio_billing').where({ studio_id: studio }).first('studio_id')) return
  await knex.transaction(async (trx) => {
    const [four, ten] = (await insertPrices(trx, studio)) as [Package, Package]
    const rafeLesson = await trx('lessons').where({ student_id: rafe }).first('id')
    await insertInvoices(trx, studio, [
      {
        student_id: rafe,
        number: 1,
        status: 'paid',
        currency: 'EUR',
        total_minor: 4000,
        issued_at: daysAgo(8),
        due_on: dateIn(6),
        paid_at: daysAgo(6),
        line: 'Lesson, 45 min',
        lesson_id: rafeLesson?.id ?? null,
      },
      {
        student_id: noor,
        number: 2,
        status: 'paid',
        paid_at: daysAgo(7),
        ...packageInvoice(four, 7),
      },
      { student_id: tobiah, number: 3, status: 'open', ...packageInvoice(four, 3) },
      { student_id: noor, number: 4, status: 'open', ...packageInvoice(ten, 1) },
    ])
  })
}
