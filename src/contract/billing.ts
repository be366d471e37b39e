// Lesson billing as client and server share it: a studio's currency, prices per lesson length and
// packages; invoices and their states; a student's ledger; the admin's totals. Amounts are integer
// minor units of the studio's ISO 4217 currency (src/contract/money.ts).
import { z } from 'zod'
import { CURRENCY_CODES, MAX_MINOR, type CurrencyCode } from './money'

export const INVOICE_STATUSES = ['draft', 'open', 'paid', 'void', 'refunded'] as const
export type InvoiceStatus = (typeof INVOICE_STATUSES)[number]

const Minor = z
  .number('Give the amount in minor units (cents).')
  .int('Give whole minor units (cents).')
  .min(0, 'An amount cannot be negative.')
  .max(MAX_MINOR, 'That amount is too large.')
const Minutes = z
  .number('Give the lesson length in minutes.')
  .int('Give whole minutes.')
  .min(5, 'A lesson lasts at least 5 minutes.')
  .max(480, 'A lesson lasts at most 8 hours.')

export const CurrencySchema = z.enum(CURRENCY_CODES, 'Choose a currency from the list.')

export const LessonPriceSchema = z.object({ durationMinutes: Minutes, amountMinor: Minor })
export type LessonPrice = z.infer<typeof LessonPriceSchema>

export const BillingSettingsInputSchema = z.object({
  currency: CurrencySchema,
  paymentDays: z
    .number('Give the days until payment is due.')
    .int('Give whole days.')
    .min(0, 'Zero days at least.')
    .max(90, 'At most 90 days.'),
  prices: z
    .array(LessonPriceSchema, 'Give the prices as a list.')
    .max(20, 'At most 20 lesson lengths.')
    .refine((list) => new Set(list.map((p) => p.durationMinutes)).size === list.length, {
      message: 'Give each lesson length one price.',
    }),
})
export type BillingSettingsInput = z.infer<typeof BillingSettingsInputSchema>

export const PackageInputSchema = z.object({
  name: z.string().trim().min(1, 'Name the package.').max(80, 'Use at most 80 characters.'),
  lessons: z.number('Give a number of lessons.').int('Whole lessons.').min(1).max(100),
  validWeeks: z.number('Give the weeks it is valid.').int('Whole weeks.').min(1).max(104),
  amountMinor: Minor,
})
export type PackageInput = z.infer<typeof PackageInputSchema>

export interface LessonPackage extends PackageInput {
  id: string
}

export interface BillingSettings {
  studioId: string
  studioName: string
  currency: CurrencyCode
  paymentDays: number
  /** True once an invoice was issued: the currency is fixed from then on. */
  currencyLocked: boolean
  prices: LessonPrice[]
  packages: LessonPackage[]
}

/** A draft invoice: for lessons (each priced by its length) or for one package. */
export const InvoiceCreateSchema = z
  .object({
    studentId: z.uuid('Choose a student.'),
    lessonIds: z.array(z.uuid('Not a valid lesson id.')).max(60, 'At most 60 lessons.').optional(),
    packageId: z.uuid('Choose a package.').optional(),
  })
  .refine((v) => (v.lessonIds?.length ? 1 : 0) + (v.packageId ? 1 : 0) === 1, {
    message: 'Invoice either some lessons or one package.',
    path: ['lessonIds'],
  })
export type InvoiceCreateInput = z.infer<typeof InvoiceCreateSchema>

export interface InvoiceLine {
  description: string
  amountMinor: number
  lessonId: string | null
}

export interface Invoice {
  id: string
  studioId: string
  studioName: string
  studentId: string
  studentName: string
  /** Given when the invoice is issued (per studio, without gaps); null for a draft. */
  number: number | null
  currency: CurrencyCode
  totalMinor: number
  status: InvoiceStatus
  packageLessons: number
  dueOn: string | null
  issuedAt: string | null
  paidAt: string | null
  lines: InvoiceLine[]
}

/** A student's account with one studio: what is owed, paid and left of their packages. */
export interface LedgerEntry {
  studioId: string
  studioName: string
  currency: CurrencyCode
  /** Sum of open invoices. */
  balanceMinor: number
  paidMinor: number
  /** Lessons of paid, still valid packages not yet used by attended lessons. */
  lessonsLeft: number
  packageValidUntil: string | null
}

export interface BillingTotals {
  currency: CurrencyCode
  status: InvoiceStatus
  invoices: number
  totalMinor: number
}
