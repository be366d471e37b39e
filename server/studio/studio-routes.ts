// /api/studio: a teacher's roster (the studio issue grows this into plans, invitations and review).
import { Router } from 'express'
import { requireAuth, requireRole } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { listTeacherStudents } from './studio-repository'

export function studioRoutes(ctx: AppContext): Router {
  const router = Router()
  router.use(requireAuth(ctx))

  router.get('/students', requireRole('teacher'), async (req, res) => {
    res.json({ students: await listTeacherStudents(ctx.db, req.user!.id) })
  })
  return router
}
