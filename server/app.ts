// createApp(): the Express application (no listen), so tests run it in-process.
import cookieParser from 'cookie-parser'
import express, { type Express } from 'express'
import { existsSync } from 'node:fs'
import path from 'node:path'
import helmet from 'helmet'
import { pinoHttp } from 'pino-http'
import { randomUUID } from 'node:crypto'
import { adminRoutes } from './admin/admin-routes'
import { authRoutes } from './auth/auth-routes'
import type { AppContext } from './context'
import { healthRoutes } from './health/health-routes'
import { instrumentsRoutes } from './instruments/instruments-routes'
import { apiNotFound, errorHandler } from './lib/errors'
import { attemptsRoutes } from './attempts/attempts-routes'
import { focusRoutes } from './focus/focus-routes'
import { progressRoutes } from './progress/progress-routes'
import { studioRoutes } from './studio/studio-routes'
import { invitationRoutes } from './studio/invitation-routes'
import { planRoutes } from './plans/plans-routes'
import { commentRoutes } from './comments/comments-routes'
import { recordingRoutes } from './recordings/recordings-routes'
import { digestRoutes } from './notifications/digest-routes'
import { worksheetRoutes } from './worksheets/worksheets-routes'

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
  api.use(express.json({ limit: '256kb' }))
  api.use('/health', healthRoutes(ctx))
  api.use('/auth', authRoutes(ctx))
  api.use('/admin', adminRoutes(ctx))
  api.use('/studio', studioRoutes(ctx))
  api.use('/invitations', invitationRoutes(ctx))
  api.use('/plans', planRoutes(ctx))
  api.use('/assignments', commentRoutes(ctx))
  api.use('/recordings', recordingRoutes(ctx))
  api.use('/admin/digests', digestRoutes(ctx))
  api.use('/instruments', instrumentsRoutes(ctx))
  api.use('/attempts', attemptsRoutes(ctx))
  api.use('/progress', progressRoutes(ctx))
  api.use('/focus', focusRoutes(ctx))
  api.use('/worksheets', worksheetRoutes(ctx))
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
  app.set('trust proxy', 'loopback')
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
