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
import { apiNotFound, errorHandler } from './lib/errors'
import { studioRoutes } from './studio/studio-routes'

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
