// /api/studio/studios and /api/studio/memberships: a teacher's studios (create, rename, delete when
// empty, remove a student) and a student's own memberships (list, leave).
import { Router } from 'express'
import { requireAuth, requireRole } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { parse, parseRequest } from '../lib/validate'
import {
  StudioIdParamsSchema,
  StudioInputSchema,
  StudioStudentParamsSchema,
} from './studios-schema'
import * as studios from './studios-service'

function studioRoutes(ctx: AppContext): Router {
  const router = Router()
  router.use(requireAuth(ctx), requireRole('teacher'))
  router.get('/', async (req, res) => {
    res.json({ studios: await studios.studiosOf(ctx, req.user!.id) })
  })
  router.post('/', async (req, res) => {
    const { name } = parse(StudioInputSchema, req)
    res.status(201).json({ studio: await studios.createStudio(ctx, req.user!.id, name) })
  })
  router.patch('/:id', async (req, res) => {
    const { params, body } = parseRequest(req, {
      params: StudioIdParamsSchema,
      body: StudioInputSchema,
    })
    res.json({ studio: await studios.renameStudio(ctx, req.user!.id, params.id, body.name) })
  })
  router.delete('/:id', async (req, res) => {
    await studios.deleteStudio(ctx, req.user!.id, parse(StudioIdParamsSchema, req, 'params').id)
    res.status(204).end()
  })
  router.delete('/:id/students/:studentId', async (req, res) => {
    const { id, studentId } = parse(StudioStudentParamsSchema, req, 'params')
    await studios.removeStudent(ctx, req.user!.id, id, studentId)
    res.status(204).end()
  })
  return router
}

function membershipRoutes(ctx: AppContext): Router {
  const router = Router()
  router.use(requireAuth(ctx), requireRole('student'))
  router.get('/', async (req, res) => {
    res.json({ memberships: await studios.membershipsOf(ctx, req.user!.id) })
  })
  router.delete('/:id', async (req, res) => {
    await studios.leaveStudio(ctx, req.user!.id, parse(StudioIdParamsSchema, req, 'params').id)
    res.status(204).end()
  })
  return router
}

export function mountStudios(api: Router, ctx: AppContext) {
  api.use('/studio/studios', studioRoutes(ctx))
  api.use('/studio/memberships', membershipRoutes(ctx))
}
