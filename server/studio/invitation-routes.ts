// /api/invitations: the public side of an invitation link — preview it, then accept it signed in
// or by creating a student account (which signs the new student in).
import { Router, type Request } from 'express'
import { SESSION_COOKIE, setSessionCookie, signSession, verifySession } from '../auth/session-token'
import type { AppContext } from '../context'
import { parse } from '../lib/validate'
import { findUserById, toPublicUser } from '../users/users-repository'
import type { PublicUser } from '../users/users-schema'
import { acceptInvitation, previewInvitation } from './invitations-service'
import { AcceptInvitationSchema, InvitationTokenQuerySchema } from './studio-schema'

/** The signed-in user when the session cookie is valid; null otherwise (no 401: signing up is allowed). */
async function sessionUser(ctx: AppContext, req: Request): Promise<PublicUser | null> {
  const claims = verifySession(req.cookies?.[SESSION_COOKIE], ctx.config.jwtSecret)
  const user = claims ? await findUserById(ctx.db, claims.sub) : null
  if (!user || !claims || user.passwordChangedAt.getTime() !== claims.pwc) return null
  return toPublicUser(user)
}

export function invitationRoutes(ctx: AppContext): Router {
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
