// /api/billing: a studio's prices and packages (its teacher), invoices (the teacher drafts, issues,
// voids, refunds; the student reads and pays their own), ledgers, the admin's totals, and the
// payment service's webhook (mounted before the JSON parser and the CSRF check: it reads the raw
// body and is authenticated by its signature).
import express, { Router } from 'express'
import { requireAuth, requireRole } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { mailLimit } from '../lib/rate-limits'
import { parse, parseRequest } from '../lib/validate'
import {
  BillingSettingsInputSchema,
  InvoiceCreateSchema,
  PackageInputSchema,
} from '../../src/contract/billing'
import { IdParamsSchema, StudentQuerySchema, StudioParamsSchema } from './billing-schema'
import * as billing from './billing-service'
import * as invoices from './invoices-service'
import { billingTotals } from './ledger-repository'
import { refundInvoice, startCheckout } from './payments-service'
import { applyEvent, verifiedEvent } from './webhook-service'

function priceRoutes(router: Router, ctx: AppContext) {
  const teacher = requireRole('teacher')
  router.get('/studios/:studioId', teacher, async (req, res) => {
    const { studioId } = parse(StudioParamsSchema, req, 'params')
    res.json({ settings: await billing.billingSettings(ctx, req.user!, studioId) })
  })
  router.put('/studios/:studioId', teacher, async (req, res) => {
    const { params, body } = parseRequest(req, {
      params: StudioParamsSchema,
      body: BillingSettingsInputSchema,
    })
    const settings = await billing.saveBillingSettings(ctx, req.user!, params.studioId, body)
    res.json({ settings })
  })
  router.post('/studios/:studioId/packages', teacher, async (req, res) => {
    const { params, body } = parseRequest(req, {
      params: StudioParamsSchema,
      body: PackageInputSchema,
    })
    res
      .status(201)
      .json({ package: await billing.addPackage(ctx, req.user!, params.studioId, body) })
  })
  router.delete('/packages/:id', teacher, async (req, res) => {
    await billing.retirePackage(ctx, req.user!, parse(IdParamsSchema, req, 'params').id)
    res.status(204).end()
  })
}

function invoiceRoutes(router: Router, ctx: AppContext) {
  const teacher = requireRole('teacher')
  const id = (req: express.Request) => parse(IdParamsSchema, req, 'params').id
  router.get('/invoices', async (req, res) => {
    const { student } = parse(StudentQuerySchema, req, 'query')
    res.json({ invoices: await invoices.invoicesFor(ctx, req.user!, student) })
  })
  router.post('/invoices', teacher, async (req, res) => {
    const input = parse(InvoiceCreateSchema, req)
    res.status(201).json({ invoice: await invoices.draftInvoice(ctx, req.user!, input) })
  })
  router.post('/invoices/:id/issue', teacher, mailLimit(ctx, 'invoice'), async (req, res) => {
    res.json({ invoice: await invoices.issueInvoice(ctx, req.user!, id(req)) })
  })
  router.post('/invoices/:id/void', teacher, async (req, res) => {
    res.json({ invoice: await invoices.voidInvoice(ctx, req.user!, id(req)) })
  })
  router.post('/invoices/:id/refund', teacher, async (req, res) => {
    res.json({ invoice: await refundInvoice(ctx, req.user!, id(req)) })
  })
  router.delete('/invoices/:id', teacher, async (req, res) => {
    await invoices.deleteDraft(ctx, req.user!, id(req))
    res.status(204).end()
  })
  router.get('/invoices/:id/pdf', async (req, res) => {
    const { invoice, pdf } = await invoices.invoicePdfFor(ctx, req.user!, id(req))
    const name = invoice.number === null ? 'invoice-draft' : `invoice-${invoice.number}`
    res.type('application/pdf').set('Content-Disposition', `attachment; filename="${name}.pdf"`)
    res.set('Cache-Control', 'private, no-store').send(pdf)
  })
  router.post('/invoices/:id/checkout', requireRole('student'), async (req, res) => {
    res.json(await startCheckout(ctx, req.user!, id(req)))
  })
}

export function billingRoutes(ctx: AppContext): Router {
  const router = Router()
  router.use(requireAuth(ctx))
  priceRoutes(router, ctx)
  invoiceRoutes(router, ctx)
  router.get('/ledger', async (req, res) => {
    const { student } = parse(StudentQuerySchema, req, 'query')
    res.json({ ledger: await invoices.ledgerFor(ctx, req.user!, student) })
  })
  router.get('/totals', requireRole('admin'), async (_req, res) => {
    res.json({ totals: await billingTotals(ctx.db) })
  })
  return router
}

/** POST /api/billing/webhook: signed by the payment service, read as raw bytes (max 256 kB). */
export function mountBillingWebhook(api: Router, ctx: AppContext) {
  api.post(
    '/billing/webhook',
    express.raw({ type: () => true, limit: '256kb' }),
    async (req, res) => {
      const body = Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0)
      const event = verifiedEvent(ctx, body, req.get('stripe-signature'))
      res.json(await applyEvent(ctx, event))
    },
  )
}
