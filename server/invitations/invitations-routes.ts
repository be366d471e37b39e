// Invitations: a teacher invites to a studio (/api/studio/studios/:id/invitations), lists, resends
// and revokes them (/api/studio/invitations); the public side of the link (/api/invitations) previews
// it, then accepts it signed in or by creating a student account (which signs the new student in).
import { Router } from 'express'
import { requireAuth, requireRole } from '../auth/auth-middleware'
import { sessionOf, startSession } from '../auth/sessions'
import type { AppContext } from '../context'
import { mailLimit, signUpLimit } from '../lib/rate-limits'
import { parse, parseRequest } from '../lib/validate'
import { StudioIdParamsSchema } from '../studios/studios-schema'
import { toPublicUser } from '../users/users-repository'
import {
  acceptInvitation,
  invite,
  inviteMany,
  listInvitations,
  previewInvitation,
  resendInvitation,
  revokeInvitation,
} from './invitations-service'
import {
  AcceptInvitationSchema,
  InvitationBatchSchema,
  InvitationIdParamsSchema,
  InvitationInputSchema,
  InvitationListQuerySchema,
  InvitationTokenQuerySchema,
} from './invitations-schema'
import * as links from './invite-links-service'
import { InviteLinkCreateSchema } from '../../src/contract/studios'

function publicRoutes(ctx: AppContext): Router {
  const router = Router()

  // The token travels in the query or body, never the path, so request logs never hold it.
  router.get('/preview', async (req, res) => {
    const { token } = parse(InvitationTokenQuerySchema, req, 'query')
    res.set('Cache-Control', 'no-store').json({ invitation: await previewInvitation(ctx, token) })
  })

  router.post('/accept', signUpLimit(ctx), async (req, res) => {
    const input = parse(AcceptInvitationSchema, req)
    // Signed in or not (no 401: accepting may create the account).
    const session = await sessionOf(ctx, req)
    const current = session ? toPublicUser(session.user) : null
    const result = await acceptInvitation(ctx, input, current)
    if (result.created) await startSession(ctx, res, result.created)
    const user = current ?? toPublicUser(result.created!)
    res.status(result.created ? 201 : 200).json({
      user,
      studio: {
        id: result.studioId,
        name: result.studioName,
        sharesFrom: result.sharesFrom?.toISOString() ?? null,
      },
      alreadyMember: result.alreadyMember,
    })
  })
  return router
}

function teacherRoutes(ctx: AppContext, inviteLimit: ReturnType<typeof mailLimit>): Router {
  const router = Router()
  router.use(requireAuth(ctx), requireRole('teacher'))
  router.get('/', async (req, res) => {
    const query = parse(InvitationListQuerySchema, req, 'query')
    res.json({ invitations: await listInvitations(ctx, req.user!.id, query) })
  })
  router.post('/:id/resend', inviteLimit, async (req, res) => {
    const { id } = parse(InvitationIdParamsSchema, req, 'params')
    res.json({ invitation: await resendInvitation(ctx, req.user!.id, id) })
  })
  router.delete('/:id', async (req, res) => {
    const { id } = parse(InvitationIdParamsSchema, req, 'params')
    res.json({ invitation: await revokeInvitation(ctx, req.user!.id, id) })
  })
  return router
}

function linkRoutes(ctx: AppContext): Router {
  const router = Router()
  router.use(requireAuth(ctx), requireRole('teacher'))
  router.get('/', async (req, res) => {
    res.json({ links: await links.listLinks(ctx, req.user!.id) })
  })
  router.delete('/:id', async (req, res) => {
    const { id } = parse(InvitationIdParamsSchema, req, 'params')
    res.json({ link: await links.revokeLink(ctx, req.user!.id, id) })
  })
  return router
}

/** Mount before the studios: the invite route lives under a studio's path. */
export function mountInvitations(api: Router, ctx: AppContext) {
  const inviteLimit = mailLimit(ctx, 'invitation')
  const teacherInviting = [requireAuth(ctx), requireRole('teacher'), inviteLimit] // within the mail limit
  api.post('/studio/studios/:id/invitations', ...teacherInviting, async (req, res) => {
    const { params, body } = parseRequest(req, {
      params: StudioIdParamsSchema,
      body: InvitationInputSchema,
    })
    const result = await invite(ctx, req.user!.id, params.id, body.email, body.message)
    res.status(result.resent ? 200 : 201).json(result)
  })
  api.post('/studio/studios/:id/invitations/batch', ...teacherInviting, async (req, res) => {
    const { params, body } = parseRequest(req, {
      params: StudioIdParamsSchema,
      body: InvitationBatchSchema,
    })
    const results = await inviteMany(ctx, req.user!.id, params.id, body.emails, body.message)
    res.json({ results })
  })
  api.post(
    '/studio/studios/:id/invite-links',
    requireAuth(ctx),
    requireRole('teacher'),
    async (req, res) => {
      const { params, body } = parseRequest(req, {
        params: StudioIdParamsSchema,
        body: InviteLinkCreateSchema,
      })
      res.status(201).json(await links.createLink(ctx, req.user!.id, params.id, body))
    },
  )
  api.use('/studio/invite-links', linkRoutes(ctx))
  api.use('/studio/invitations', teacherRoutes(ctx, inviteLimit))
  api.use('/invitations', publicRoutes(ctx))
}
