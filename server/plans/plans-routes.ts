// /api/plans: teachers' plans (CRUD, copy, assign), the starter library, a student's assigned plans,
// and the plan item a drill view opens (/practice/<drill>?planItem=<id>).
import { Router, type Request } from 'express'
import { requireAuth, requireRole } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { mailLimit } from '../lib/rate-limits'
import { parse, parseRequest } from '../lib/validate'
import { assignmentsOfStudent } from './assigned-plans'
import { AssignSchema, PlanCreateSchema, PlanUpdateSchema } from '../../src/contract/plans'
import { PlanIdParamsSchema, PlanItemIdParamsSchema, PlanStudentParamsSchema } from './plans-schema'
import * as plans from './plans-service'

export function planRoutes(ctx: AppContext): Router {
  const router = Router()
  router.use(requireAuth(ctx))
  const teacher = requireRole('teacher')

  router.get('/', teacher, async (req, res) => {
    res.json({ plans: await plans.listPlans(ctx, req.user!.id) })
  })
  router.get('/starters', teacher, (_req, res) => {
    res.json({ starters: plans.starterPlans() })
  })
  router.get('/assigned', requireRole('student'), async (req, res) => {
    res.json({ assignments: await assignmentsOfStudent(ctx, req.user!.id) })
  })
  router.get('/items/:id', async (req, res) => {
    const { id } = parse(PlanItemIdParamsSchema, req, 'params')
    res.json(await plans.planItemContext(ctx, req.user!, id))
  })
  const assigning = (req: Request) =>
    Array.isArray(req.body?.studentIds) && req.body.studentIds.length > 0
  router.post('/', teacher, mailLimit(ctx, 'assignment', assigning), async (req, res) => {
    res
      .status(201)
      .json({ plan: await plans.createPlan(ctx, req.user!, parse(PlanCreateSchema, req)) })
  })
  router.get('/:id', teacher, async (req, res) => {
    const { id } = parse(PlanIdParamsSchema, req, 'params')
    res.json({ plan: await plans.getPlan(ctx, req.user!.id, id) })
  })
  const movingDue = (req: Request) => req.body?.dueAt !== undefined
  router.put('/:id', teacher, mailLimit(ctx, 'due-date', movingDue), async (req, res) => {
    const { params, body } = parseRequest(req, {
      params: PlanIdParamsSchema,
      body: PlanUpdateSchema,
    })
    res.json({ plan: await plans.updatePlan(ctx, req.user!, params.id, body) })
  })
  router.delete('/:id', teacher, async (req, res) => {
    await plans.deletePlan(ctx, req.user!.id, parse(PlanIdParamsSchema, req, 'params').id)
    res.status(204).end()
  })
  router.post('/:id/copy', teacher, async (req, res) => {
    const { id } = parse(PlanIdParamsSchema, req, 'params')
    res.status(201).json({ plan: await plans.copyPlan(ctx, req.user!.id, id) })
  })
  router.post('/:id/assignments', teacher, mailLimit(ctx, 'assignment'), async (req, res) => {
    const { params, body } = parseRequest(req, { params: PlanIdParamsSchema, body: AssignSchema })
    res.json({ plan: await plans.assignPlan(ctx, req.user!, params.id, body.studentIds) })
  })
  router.delete('/:id/assignments/:studentId', teacher, async (req, res) => {
    const { id, studentId } = parse(PlanStudentParamsSchema, req, 'params')
    res.json({ plan: await plans.unassignPlan(ctx, req.user!.id, id, studentId) })
  })
  return router
}
