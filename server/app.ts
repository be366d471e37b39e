// createApp(): the Express application (no listen), so tests run it in-process.
import cookieParser from 'cookie-parser'
import express, { type Express } from 'express'
import { existsSync } from 'node:fs'
import path from 'node:path'
import helmet from 'helmet'
import { pinoHttp } from 'pino-http'
import { randomUUID } from 'node:crypto'
import { accountRoutes } from './account/account-routes'
import { adminRoutes } from './admin/admin-routes'
import { authRoutes } from './auth/auth-routes'
import type { AppContext } from './context'
import { healthRoutes } from './health/health-routes'
import { instrumentsRoutes } from './instruments/instruments-routes'
import { requireCsrfHeader } from './lib/csrf'
import { apiNotFound, errorHandler } from './lib/errors'
import { rejectNulText } from './lib/text-guard'
import { attemptsRoutes } from './attempts/attempts-routes'
import { focusRoutes } from './focus/focus-routes'
import { progressRoutes } from './progress/progress-routes'
import { mountAssignments } from './assignments/assignments-routes'
import { recordingRoutes } from './recordings/recordings-routes'
import { mountDigests } from './digests/digest-routes'
import { mountInvitations } from './invitations/invitations-routes'
import { planRoutes } from './plans/plans-routes'
import { mountRoster } from './roster/roster-routes'
import { mountStudios } from './studios/studios-routes'
import { lessonRoutes } from './lessons/lessons-routes'
import { messageRoutes } from './messages/messages-routes'
import { worksheetRoutes } from './worksheets/worksheets-routes'
import { shareRoutes } from './shares/shares-routes'
import { billingRoutes, mountBillingWebhook } from './billing/billing-routes'

// Same-origin only; blob: for recorded audio, audio worklets and exported board images.
const CSP_DIRECTIVES = {
  'script-src': ["'self'", 'blob:'],
  'worker-src': ["'self'", 'blob:'],
  'media-src': ["'self'", 'blob:'],
  'img-src': ["'self'", 'data:', 'blob:'],
  'connect-src': ["'self'"],
  'upgrade-insecure-requests': null,
}

function apiRouter(ctx: AppContext) {
  const api = express.Router()
  mountBillingWebhook(api, ctx) // signed raw body: before the CSRF check and the JSON parser
  api.use(requireCsrfHeader)
  api.use(express.json({ limit: '256kb' }))
  api.use(rejectNulText)
  api.use('/health', healthRoutes(ctx))
  api.use('/auth', authRoutes(ctx))
  api.use('/account', accountRoutes(ctx))
  mountDigests(api, ctx) // under /admin/digests: before the admin router's own guard
  api.use('/admin', adminRoutes(ctx))
  mountInvitations(api, ctx) // its invite route lies under a studio's path
  mountStudios(api, ctx)
  mountRoster(api, ctx)
  api.use('/plans', planRoutes(ctx))
  api.use('/lessons', lessonRoutes(ctx))
  api.use('/messages', messageRoutes(ctx))
  mountAssignments(api, ctx)
  api.use('/recordings', recordingRoutes(ctx))
  api.use('/instruments', instrumentsRoutes(ctx))
  api.use('/attempts', attemptsRoutes(ctx))
  api.use('/progress', progressRoutes(ctx))
  api.use('/focus', focusRoutes(ctx))
  api.use('/worksheets', worksheetRoutes(ctx))
  api.use('/shares', shareRoutes(ctx))
  api.use('/billing', billingRoutes(ctx))
  api.use(apiNotFound)
  return api
}

/** Serves the built client with an SPA fallback to index.html. */
function serveClient(app: Express, dist: string) {
  const index = path.join(dist, 'index.html')
  if (!existsSync(index)) return
  app.use(express.static(dist, { index: false, maxAge: '1h' }))
  app.get('/{*splat}', (_req, res) => res.sendFile('index.html', { root: dist }))
}

export function createApp(ctx: AppContext): Express {
  const app = express()
  app.disable('x-powered-by')
  // X-Forwarded-* only count when TRUST_PROXY names the proxy; else anyone could pick an address.
  app.set('trust proxy', ctx.config.trustProxy)
  app.use(
    pinoHttp({
      logger: ctx.logger,
      genReqId: (req) => (req.headers['x-request-id'] as string | undefined) ?? randomUUID(),
      autoLogging: { ignore: (req) => !req.url?.startsWith('/api') },
      // Method, path and status only: no headers, so no cookies or tokens reach the log.
      serializers: {
        req: (req: { id: string; method: string; url: string }) => ({
          id: req.id,
          method: req.method,
          url: req.url.split('?')[0],
        }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
      },
    }),
  )
  app.use(helmet({ contentSecurityPolicy: { directives: CSP_DIRECTIVES } }))
  app.use(cookieParser())
  app.use('/api', apiRouter(ctx))
  serveClient(app, ctx.config.clientDist)
  app.use(errorHandler)
  return app
}
