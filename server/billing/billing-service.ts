// Studio prices: a teacher reads and sets their studio's currency, payment days and prices per
// lesson length, and adds or retires packages of lessons. Only the studio's own teacher may.
import type { AppContext } from '../context'
import { conflict, forbidden, notFound } from '../lib/errors'
import type { PublicUser } from '../users/users-schema'
import type {
  BillingSettings,
  BillingSettingsInput,
  PackageInput,
} from '../../src/contract/billing'
import * as prices from './prices-repository'

/** The studio's billing row when the teacher runs that studio; 404/403 otherwise. */
export async function ownStudio(ctx: AppContext, teacher: PublicUser, studioId: string) {
  const studio = await prices.studioBilling(ctx.db, studioId)
  if (!studio) throw notFound('That studio')
  if (studio.teacherId !== teacher.id) throw forbidden('This studio belongs to another teacher.')
  return studio
}

export async function billingSettings(
  ctx: AppContext,
  teacher: PublicUser,
  studioId: string,
): Promise<BillingSettings> {
  const studio = await ownStudio(ctx, teacher, studioId)
  return {
    studioId,
    studioName: studio.studioName,
    currency: studio.currency,
    paymentDays: studio.paymentDays,
    currencyLocked: await prices.hasIssuedInvoices(ctx.db, studioId),
    prices: await prices.listPrices(ctx.db, studioId),
    packages: await prices.listPackages(ctx.db, studioId),
  }
}

export async function saveBillingSettings(
  ctx: AppContext,
  teacher: PublicUser,
  studioId: string,
  input: BillingSettingsInput,
) {
  const studio = await ownStudio(ctx, teacher, studioId)
  if (input.currency !== studio.currency && (await prices.hasIssuedInvoices(ctx.db, studioId)))
    throw conflict('The currency is fixed once an invoice was issued.', {
      currency: [`This studio bills in ${studio.currency}.`],
    })
  await prices.saveSettings(ctx.db, studioId, input)
  return billingSettings(ctx, teacher, studioId)
}

export async function addPackage(
  ctx: AppContext,
  teacher: PublicUser,
  studioId: string,
  input: PackageInput,
) {
  await ownStudio(ctx, teacher, studioId)
  return prices.insertPackage(ctx.db, studioId, input)
}

export async function retirePackage(ctx: AppContext, teacher: PublicUser, packageId: string) {
  const found = await prices.findPackage(ctx.db, packageId)
  if (!found) throw notFound('That package')
  await ownStudio(ctx, teacher, found.studioId)
  await prices.retirePackage(ctx.db, packageId)
}
