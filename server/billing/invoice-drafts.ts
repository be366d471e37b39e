// Building a draft invoice: lines for lessons (each priced by its length at the studio's price) or
// one line for a package; every refusal names the field it is about.
import type { AppContext } from '../context'
import { badRequest, conflict, forbidden, notFound } from '../lib/errors'
import type { PublicUser } from '../users/users-schema'
import type { InvoiceCreateInput, InvoiceLine } from '../../src/contract/billing'
import { ownStudio } from './billing-service'
import * as invoices from './invoices-repository'
import * as prices from './prices-repository'
import { formatMoney, perLesson } from '../../src/contract/money'

type Lesson = Awaited<ReturnType<typeof invoices.lessonsToBill>>[number]

const lessonWords = (l: Lesson) =>
  new Intl.DateTimeFormat('en-GB', {
    timeZone: l.time_zone,
    dateStyle: 'medium',
    timeStyle: 'short',
  }).format(l.starts_at)

async function studentInStudio(ctx: AppContext, studioId: string, studentId: string) {
  const row = await ctx
    .db('studio_members')
    .where({ studio_id: studioId, student_id: studentId })
    .first('student_id')
  if (!row) throw forbidden('Invoices go to students of your studios.')
}

async function packageDraft(ctx: AppContext, teacher: PublicUser, input: InvoiceCreateInput) {
  const found = await prices.findPackage(ctx.db, input.packageId!)
  if (!found) throw notFound('That package')
  const studio = await ownStudio(ctx, teacher, found.studioId)
  await studentInStudio(ctx, studio.studioId, input.studentId)
  const line: InvoiceLine = {
    description: `${found.name}: ${found.lessons} lessons (${formatMoney(perLesson(found.amountMinor, found.lessons), studio.currency)} each), valid ${found.validWeeks} weeks from payment`,
    amountMinor: found.amountMinor,
    lessonId: null,
  }
  return {
    studioId: studio.studioId,
    studentId: input.studentId,
    currency: studio.currency,
    packageId: found.id,
    packageLessons: found.lessons,
    packageWeeks: found.validWeeks,
    lines: [line],
  }
}

function checkLessons(found: Lesson[], wanted: string[]) {
  if (found.length !== new Set(wanted).size)
    throw badRequest('Some lessons are not yours with this student.', {
      lessonIds: ['Choose lessons you teach this student.'],
    })
  if (found.some((l) => l.status === 'cancelled'))
    throw badRequest('Cancelled lessons are not billed.', {
      lessonIds: ['Leave out cancelled lessons.'],
    })
  if (found.some((l) => l.billed))
    throw conflict('A lesson is already on an invoice.', {
      lessonIds: ['Leave out lessons already invoiced (void that invoice first).'],
    })
  if (new Set(found.map((l) => l.studio_id)).size > 1)
    throw badRequest('One invoice bills one studio.', {
      lessonIds: ['Choose lessons of one studio.'],
    })
}

async function lessonsDraft(ctx: AppContext, teacher: PublicUser, input: InvoiceCreateInput) {
  const ids = input.lessonIds!
  const found = await invoices.lessonsToBill(ctx.db, teacher.id, input.studentId, ids)
  checkLessons(found, ids)
  const studio = await ownStudio(ctx, teacher, found[0]!.studio_id)
  const priceOf = new Map(
    (await prices.listPrices(ctx.db, studio.studioId)).map((p) => [
      p.durationMinutes,
      p.amountMinor,
    ]),
  )
  const unpriced = [...new Set(found.map((l) => l.duration_minutes))].filter((m) => !priceOf.has(m))
  if (unpriced.length)
    throw badRequest('Some lesson lengths have no price yet.', {
      lessonIds: [`Set a price for ${unpriced.join(', ')}-minute lessons first.`],
    })
  const lines = found.map((l) => ({
    description: `Lesson ${lessonWords(l)}, ${l.duration_minutes} min`,
    amountMinor: priceOf.get(l.duration_minutes)!,
    lessonId: l.id,
  }))
  return {
    studioId: studio.studioId,
    studentId: input.studentId,
    currency: studio.currency,
    packageId: null,
    packageLessons: 0,
    packageWeeks: 0,
    lines,
  }
}

/** Writes a draft invoice and returns its id. */
export async function createDraft(ctx: AppContext, teacher: PublicUser, input: InvoiceCreateInput) {
  const draft = input.packageId
    ? await packageDraft(ctx, teacher, input)
    : await lessonsDraft(ctx, teacher, input)
  return invoices.insertDraft(ctx.db, draft)
}
