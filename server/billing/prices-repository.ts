// studio_billing, lesson_prices and lesson_packages: a studio's currency, invoice counter, prices
// per lesson length and packages of lessons.
import type { Db } from '../lib/db'
import type { LessonPackage, LessonPrice, PackageInput } from '../../src/contract/billing'
import type { CurrencyCode } from '../../src/contract/money'

export interface StudioBillingRow {
  studioId: string
  studioName: string
  teacherId: string
  currency: CurrencyCode
  paymentDays: number
}

/** The studio with its billing row (created with the defaults the first time it is asked for). */
export async function studioBilling(db: Db, studioId: string): Promise<StudioBillingRow | null> {
  const studio = await db('studios').where({ id: studioId }).first('id', 'name', 'teacher_id')
  if (!studio) return null
  await db('studio_billing').insert({ studio_id: studioId }).onConflict('studio_id').ignore()
  const row = await db('studio_billing').where({ studio_id: studioId }).first()
  return {
    studioId,
    studioName: studio.name,
    teacherId: studio.teacher_id,
    currency: row.currency,
    paymentDays: row.payment_days,
  }
}

export async function hasIssuedInvoices(db: Db, studioId: string) {
  const row = await db('invoices')
    .where({ studio_id: studioId })
    .whereNot({ status: 'draft' })
    .first('id')
  return row !== undefined
}

export async function listPrices(db: Db, studioId: string): Promise<LessonPrice[]> {
  const rows = await db('lesson_prices').where({ studio_id: studioId }).orderBy('duration_minutes')
  return rows.map((r) => ({ durationMinutes: r.duration_minutes, amountMinor: r.amount_minor }))
}

/** Replaces the studio's currency, payment days and prices in one transaction. */
export async function saveSettings(
  db: Db,
  studioId: string,
  input: { currency: CurrencyCode; paymentDays: number; prices: LessonPrice[] },
) {
  await db.transaction(async (trx) => {
    await trx('studio_billing').where({ studio_id: studioId }).update({
      currency: input.currency,
      payment_days: input.paymentDays,
      updated_at: trx.fn.now(),
    })
    await trx('lesson_prices').where({ studio_id: studioId }).delete()
    if (input.prices.length)
      await trx('lesson_prices').insert(
        input.prices.map((p) => ({
          studio_id: studioId,
          duration_minutes: p.durationMinutes,
          amount_minor: p.amountMinor,
        })),
      )
  })
}

interface PackageRow {
  id: string
  studio_id: string
  name: string
  lessons: number
  valid_weeks: number
  amount_minor: number
}

const toPackage = (r: PackageRow): LessonPackage => ({
  id: r.id,
  name: r.name,
  lessons: r.lessons,
  validWeeks: r.valid_weeks,
  amountMinor: r.amount_minor,
})

export async function listPackages(db: Db, studioId: string): Promise<LessonPackage[]> {
  const rows: PackageRow[] = await db('lesson_packages')
    .where({ studio_id: studioId, active: true })
    .orderBy(['lessons', 'created_at'])
  return rows.map(toPackage)
}

export async function insertPackage(db: Db, studioId: string, input: PackageInput) {
  const [row] = await db('lesson_packages')
    .insert({
      studio_id: studioId,
      name: input.name,
      lessons: input.lessons,
      valid_weeks: input.validWeeks,
      amount_minor: input.amountMinor,
    })
    .returning('*')
  return toPackage(row as PackageRow)
}

/** An active package with its studio, or null. */
export async function findPackage(db: Db, id: string) {
  const row: PackageRow | undefined = await db('lesson_packages')
    .where({ id, active: true })
    .first()
  return row ? { ...toPackage(row), studioId: row.studio_id } : null
}

/** Packages are retired, not deleted: invoices keep pointing at what was sold. */
export const retirePackage = (db: Db, id: string) =>
  db('lesson_packages').where({ id }).update({ active: false })
