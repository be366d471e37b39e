// A local fake of the payment service (the parts of Stripe's API we use) on 127.0.0.1: checkout
// sessions with a hosted test page where a test "pays", refunds, and webhooks signed with the
// Stripe-Signature scheme (t=…,v1=HMAC-SHA256 of "t.body"). It holds no card data and moves no money.
import { createHmac, randomBytes } from 'node:crypto'
import express from 'express'

const id = (prefix) => `${prefix}_test_${randomBytes(12).toString('hex')}`
const now = () => Math.floor(Date.now() / 1000)
const escape = (text) => String(text).replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`)

/** The Stripe-Signature header for a payload, as Stripe's SDK checks it. */
export function signPayload(payload, secret, timestamp = now()) {
  const v1 = createHmac('sha256', secret).update(`${timestamp}.${payload}`).digest('hex')
  return `t=${timestamp},v1=${v1}`
}

function stripeError(res, status, message, param) {
  res.status(status).json({ error: { type: 'invalid_request_error', message, param } })
}

class FakeState {
  constructor(options) {
    this.options = options
    this.sessions = new Map()
    this.intents = new Map()
    this.refunds = new Map()
    this.idempotent = new Map()
    this.events = []
  }

  async emit(type, object) {
    const event = {
      id: id('evt'),
      object: 'event',
      api_version: '2026-01-01',
      created: now(),
      livemode: false,
      pending_webhooks: 1,
      type,
      data: { object },
    }
    this.events.push(event)
    await this.deliver(event)
    return event
  }

  /** Posts the event to the app's webhook (three tries); answers the last status or null. */
  async deliver(event) {
    const url = this.options.webhookUrl
    if (!url) return null
    const payload = JSON.stringify(event, null, 2)
    for (let attempt = 1; attempt <= 3; attempt++) {
      try {
        const res = await fetch(url, {
          method: 'POST',
          headers: {
            'content-type': 'application/json',
            'stripe-signature': signPayload(payload, this.options.webhookSecret),
          },
          body: payload,
        })
        if (res.status < 500) return res.status
      } catch {
        // the app is restarting: try again
      }
      await new Promise((r) => setTimeout(r, 250 * attempt))
    }
    return null
  }
}

function sessionFrom(body, base) {
  const items = Array.isArray(body.line_items)
    ? body.line_items
    : Object.values(body.line_items ?? {})
  const lines = items.map((item) => ({
    quantity: Number(item.quantity ?? 1),
    amount: Number(item.price_data?.unit_amount),
    currency: String(item.price_data?.currency ?? '').toLowerCase(),
    name: String(item.price_data?.product_data?.name ?? ''),
  }))
  if (!lines.length || lines.some((l) => !Number.isSafeInteger(l.amount) || l.amount < 0))
    return null
  const sessionId = id('cs')
  return {
    id: sessionId,
    object: 'checkout.session',
    mode: body.mode ?? 'payment',
    status: 'open',
    payment_status: 'unpaid',
    amount_total: lines.reduce((sum, l) => sum + l.amount * l.quantity, 0),
    currency: lines[0].currency,
    client_reference_id: body.client_reference_id ?? null,
    customer_email: body.customer_email ?? null,
    metadata: body.metadata ?? {},
    payment_intent: null,
    success_url: body.success_url,
    cancel_url: body.cancel_url,
    url: `${base}/checkout/${sessionId}`,
    created: now(),
    _lines: lines,
    _intentMetadata: body.payment_intent_data?.metadata ?? {},
  }
}

const publicSession = ({ _lines, _intentMetadata, ...session }) => session

function amountText(minor, currency) {
  const format = new Intl.NumberFormat('en', { style: 'currency', currency })
  const digits = format.resolvedOptions().maximumFractionDigits
  return format.format(minor / 10 ** digits)
}

function checkoutPage(session) {
  const line = session._lines[0]
  const total = amountText(session.amount_total, session.currency.toUpperCase())
  const paid = session.payment_status === 'paid'
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Test checkout</title>
<style>body{font:16px system-ui,sans-serif;max-width:28rem;margin:3rem auto;padding:0 1rem}
.box{border:1px solid #bbb;border-radius:8px;padding:1.5rem}button{font-size:1rem;padding:.6rem 1.2rem}</style>
</head><body><main class="box"><h1>Test checkout</h1>
<p>A local stand-in for the payment service: no card is asked for and no money moves.</p>
<p data-testid="item">${escape(line.name)}</p><p><strong data-testid="total">${escape(total)}</strong></p>
${
  paid
    ? '<p role="status">Already paid.</p>'
    : `<form method="post" action="/checkout/${session.id}/pay">
<button type="submit">Pay ${escape(total)} (test)</button></form>`
}
<p><a href="${escape(session.cancel_url ?? '/')}">Cancel and go back</a></p></main></body></html>`
}

async function pay(state, session) {
  const intentId = id('pi')
  const intent = {
    id: intentId,
    amount: session.amount_total,
    currency: session.currency,
    metadata: session._intentMetadata,
    charge: id('ch'),
    refunded: false,
  }
  state.intents.set(intentId, intent)
  Object.assign(session, { status: 'complete', payment_status: 'paid', payment_intent: intentId })
  await state.emit('checkout.session.completed', publicSession(session))
}

function chargeOf(intent) {
  return {
    id: intent.charge,
    object: 'charge',
    amount: intent.amount,
    amount_refunded: intent.refunded ? intent.amount : 0,
    currency: intent.currency,
    payment_intent: intent.id,
    refunded: intent.refunded,
    metadata: intent.metadata,
  }
}

async function refund(state, body, res) {
  const intent = state.intents.get(body.payment_intent)
  if (!intent) return stripeError(res, 404, 'No such payment_intent', 'payment_intent')
  if (intent.refunded)
    return stripeError(res, 400, 'Charge has already been refunded.', 'payment_intent')
  intent.refunded = true
  const made = {
    id: id('re'),
    object: 'refund',
    amount: intent.amount,
    currency: intent.currency,
    payment_intent: intent.id,
    charge: intent.charge,
    status: 'succeeded',
    metadata: body.metadata ?? {},
  }
  state.refunds.set(made.id, made)
  res.json(made)
  await state.emit('charge.refunded', chargeOf(intent))
}

function apiRoutes(app, state, base) {
  const api = express.Router()
  api.use(express.urlencoded({ extended: true }))
  api.use((req, res, next) => {
    if (req.get('authorization') !== `Bearer ${state.options.secretKey}`)
      return stripeError(res, 401, 'Invalid API Key provided.')
    // Same Idempotency-Key, same answer (the SDK retries with it).
    const key = req.get('idempotency-key')
    const seen = key && state.idempotent.get(key)
    if (seen) return res.status(seen.status).json(seen.body)
    const json = res.json.bind(res)
    res.json = (body) => {
      if (key) state.idempotent.set(key, { status: res.statusCode, body })
      return json(body)
    }
    next()
  })
  api.post('/checkout/sessions', (req, res) => {
    const session = sessionFrom(req.body, base())
    if (!session) return stripeError(res, 400, 'Give line items with amounts.', 'line_items')
    state.sessions.set(session.id, session)
    res.json(publicSession(session))
  })
  api.get('/checkout/sessions/:id', (req, res) => {
    const session = state.sessions.get(req.params.id)
    if (!session) return stripeError(res, 404, 'No such checkout session', 'id')
    res.json(publicSession(session))
  })
  api.post('/refunds', (req, res) => refund(state, req.body, res))
  app.use('/v1', api)
}

function pageRoutes(app, state) {
  app.get('/checkout/:id', (req, res) => {
    const session = state.sessions.get(req.params.id)
    if (!session) return res.status(404).type('text').send('No such checkout.')
    res.type('html').send(checkoutPage(session))
  })
  app.post('/checkout/:id/pay', async (req, res) => {
    const session = state.sessions.get(req.params.id)
    if (!session) return res.status(404).type('text').send('No such checkout.')
    if (session.payment_status !== 'paid') await pay(state, session)
    res.redirect(303, session.success_url ?? '/')
  })
  // For tests: every event sent, and sending one again (a duplicate delivery).
  app.get('/_fake/events', (_req, res) => res.json({ events: state.events }))
  app.post('/_fake/events/:id/resend', async (req, res) => {
    const event = state.events.find((e) => e.id === req.params.id)
    if (!event) return res.status(404).json({ error: 'no such event' })
    res.json({ status: await state.deliver(event) })
  })
}

/**
 * Starts the fake on 127.0.0.1 (port 0: a free one). `webhookUrl` may be set later with
 * `setWebhookUrl` (an app that listens after the fake starts).
 */
export async function startPaymentsFake(options = {}) {
  const state = new FakeState({
    secretKey: options.secretKey ?? `sk_test_${randomBytes(24).toString('hex')}`,
    webhookSecret: options.webhookSecret ?? `whsec_${randomBytes(24).toString('hex')}`,
    webhookUrl: options.webhookUrl,
  })
  const app = express()
  app.disable('x-powered-by')
  let url = ''
  apiRoutes(app, state, () => url)
  pageRoutes(app, state)
  const server = await new Promise((resolve) => {
    const s = app.listen(options.port ?? 0, '127.0.0.1', () => resolve(s))
  })
  url = `http://127.0.0.1:${server.address().port}`
  return {
    url,
    secretKey: state.options.secretKey,
    webhookSecret: state.options.webhookSecret,
    events: state.events,
    setWebhookUrl: (to) => void (state.options.webhookUrl = to),
    close: () => new Promise((resolve) => server.close(() => resolve())),
  }
}

/**
 * For npm start and the e2e set-up: without STRIPE_SECRET_KEY in the environment, starts the fake
 * with keys made up now and answers the environment the app needs; with it, changes nothing.
 */
export async function startLocalPayments(appUrl, env = process.env) {
  if (env.STRIPE_SECRET_KEY) return { env: {}, close: async () => {} }
  const fake = await startPaymentsFake({ webhookUrl: `${appUrl}/api/billing/webhook` })
  return {
    env: {
      STRIPE_SECRET_KEY: fake.secretKey,
      STRIPE_WEBHOOK_SECRET: fake.webhookSecret,
      STRIPE_API_URL: fake.url,
    },
    close: fake.close,
  }
}
