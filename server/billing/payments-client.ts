// The official Stripe SDK, pointed at STRIPE_API_URL when set (our local fake on loopback) and at
// Stripe itself otherwise; null when no key is configured (payments are then unavailable).
import Stripe from 'stripe'
import type { Config } from '../config'
import { AppError } from '../lib/errors'

const clients = new WeakMap<Config, Stripe>()

function create(config: Config & { stripeSecretKey: string }): Stripe {
  const url = config.stripeApiUrl ? new URL(config.stripeApiUrl) : null
  return new Stripe(config.stripeSecretKey, {
    maxNetworkRetries: 2,
    timeout: 20_000,
    ...(url && {
      host: url.hostname,
      port: Number(url.port || (url.protocol === 'https:' ? 443 : 80)),
      protocol: url.protocol === 'https:' ? 'https' : 'http',
    }),
  })
}

/** The configured client, or a 503 that says payments are not set up. */
export function paymentsClient(config: Config): Stripe {
  if (!config.stripeSecretKey || !config.stripeWebhookSecret)
    throw new AppError('payments_unavailable', 'Card payments are not set up on this server.', 503)
  let client = clients.get(config)
  if (!client) {
    client = create({ ...config, stripeSecretKey: config.stripeSecretKey })
    clients.set(config, client)
  }
  return client
}
