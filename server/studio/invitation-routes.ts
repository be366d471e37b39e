// /api/invitations: the public side of an invitation link — preview it, then accept it signed in
// or by creating a student account (which signs the new student in).
import { Router } from 'express'
import { sessionOf, startSession } from '../auth/sessions'
import type { AppContext } from '../context'
import { signUpLimit } from '../lib/rate-limits'
import { parse } from '../lib/validate'
import { toPublicUser } from '../users/users-repository'
import { acceptInvitation, previewInvitation } from './invitations-service'
import { AcceptInvitationSchema, InvitationTokenQuerySchema } from './studio-schema'

export function invitationRoutes(ctx: AppContext): Router {
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
      studio: { id: result.studioId, name: result.studioName },
      alreadyMember: result.alreadyMember,
    })
  })
  return router
}
