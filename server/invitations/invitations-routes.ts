// Invitations: a teacher invites to a studio (/api/studio/studios/:id/invitations), lists, resends
// and revokes them (/api/studio/invitations); the public side of the link (/api/invitations) previews
// it, then accepts it signed in or by creating a student account (which signs the new student in).
import { Router, type Request } from 'express'
import { requireAuth, requireRole } from '../auth/auth-middleware'
import { SESSION_COOKIE, setSessionCookie, signSession, verifySession } from '../auth/session-token'
import type { AppContext } from '../context'
import { parse, parseRequest } from '../lib/validate'
import { StudioIdParamsSchema } from '../studios/studios-schema'
import { findUserById, toPublicUser } from '../users/users-repository'
import type { PublicUser } from '../users/users-schema'
import {
  acceptInvitation,
  invite,
  listInvitations,
  previewInvitation,
  resendInvitation,
  revokeInvitation,
} from './invitations-service'
import {
  AcceptInvitationSchema,
  InvitationIdParamsSchema,
  InvitationInputSchema,
  InvitationListQuerySchema,
  InvitationTokenQuerySchema,
} from './invitations-schema'

/** The signed-in user when the session cookie is valid; null otherwise (no 401: signing up is allowed). */
async function sessionUser(ctx: AppContext, req: Request): Promise<PublicUser | null> {
  const claims = verifySession(req.cookies?.[SESSION_COOKIE], ctx.config.jwtSecret)
  const user = claims ? await findUserById(ctx.db, claims.sub) : null
  if (!user || !claims || user.passwordChangedAt.getTime() !== claims.pwc) return null
  return toPublicUser(user)
}

function publicRoutes(ctx: AppContext): Router {
  const router = Router()

  // The token travels in the query or body, never the path, so request logs never hold it.
  router.get('/preview', async (req, res) => {
    const { token } = parse(InvitationTokenQuerySchema, req, 'query')
    res.set('Cache-Control', 'no-store').json({ invitation: await previewInvitation(ctx, token) })
  })

  router.post('/accept', async (req, res) => {
    const input = parse(AcceptInvitationSchema, req)
    const current = await sessionUser(ctx, req)
    const result = await acceptInvitation(ctx, input, current)
    if (result.created)
      setSessionCookie(req, res, signSession(result.created, ctx.config.jwtSecret))
    const user = current ?? toPublicUser(result.created!)
    res.status(result.created ? 201 : 200).json({
      user,
      studio: { id: result.studioId, name: result.studioName },
      alreadyMember: result.alreadyMember,
    })
  })
  return router
}

function teacherRoutes(ctx: AppContext): Router {
  const router = Router()
  router.use(requireAuth(ctx), requireRole('teacher'))
  router.get('/', async (req, res) => {
    const query = parse(InvitationListQuerySchema, req, 'query')
    res.json({ invitations: await listInvitations(ctx, req.user!.id, query) })
  })
  router.post('/:id/resend', async (req, res) => {
    const { id } = parse(InvitationIdParamsSchema, req, 'params')
    res.json({ invitation: await resendInvitation(ctx, req.user!.id, id) })
  })
  router.delete('/:id', async (req, res) => {
    const { id } = parse(InvitationIdParamsSchema, req, 'params')
    res.json({ invitation: await revokeInvitation(ctx, req.user!.id, id) })
  })
  return router
}

/** Mount before the studios: the invite route lives under a studio's path. */
export function mountInvitations(api: Router, ctx: AppContext) {
  api.post(
    '/studio/studios/:id/invitations',
    requireAuth(ctx),
    requireRole('teacher'),
    async (req, res) => {
      const { params, body } = parseRequest(req, {
        params: StudioIdParamsSchema,
        body: InvitationInputSchema,
      })
      const result = await invite(ctx, req.user!.id, params.id, body.email)
      res.status(result.resent ? 200 : 201).json(result)
    },
  )
  api.use('/studio/invitations', teacherRoutes(ctx))
  api.use('/invitations', publicRoutes(ctx))
}
