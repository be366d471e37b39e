// /api/studio: a teacher's studios, invitations, roster (paged, sorted, filtered, CSV) and student
// pages; a student's own memberships. The roster contract GET /students is used by outside checks.
import { Router, type Response } from 'express'
import { requireAuth, requireRole } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { mailLimit } from '../lib/rate-limits'
import { parse, parseRequest } from '../lib/validate'
import { studentAssignmentsForTeacher } from '../plans/assignments-service'
import { rosterCsv, resultsCsv } from './export-service'
import { invite, listInvitations, resendInvitation, revokeInvitation } from './invitations-service'
import { pageRoster } from './roster-query'
import { rosterRowOf, rosterRows } from './roster-service'
import { listTeacherStudents } from './studio-repository'
import {
  InvitationIdParamsSchema,
  InvitationInputSchema,
  InvitationListQuerySchema,
  ResultsExportQuerySchema,
  RosterExportQuerySchema,
  RosterQuerySchema,
  StudentIdParamsSchema,
  StudioIdParamsSchema,
  StudioInputSchema,
  StudioStudentParamsSchema,
} from './studio-schema'
import * as studios from './studio-service'

function sendCsv(res: Response, file: { fileName: string; csv: string }) {
  res
    .type('text/csv; charset=utf-8')
    .attachment(file.fileName)
    .set('Cache-Control', 'no-store')
    .send(file.csv)
}

/** Studios, members and invitations (teachers); memberships (students). */
function studioManagement(ctx: AppContext, router: Router) {
  const teacher = requireRole('teacher')
  const inviteLimit = mailLimit(ctx, 'invitation')
  router.get('/studios', teacher, async (req, res) => {
    res.json({ studios: await studios.studiosOf(ctx, req.user!.id) })
  })
  router.post('/studios', teacher, async (req, res) => {
    res.status(201).json({
      studio: await studios.createStudio(ctx, req.user!.id, parse(StudioInputSchema, req).name),
    })
  })
  router.patch('/studios/:id', teacher, async (req, res) => {
    const { params, body } = parseRequest(req, {
      params: StudioIdParamsSchema,
      body: StudioInputSchema,
    })
    res.json({ studio: await studios.renameStudio(ctx, req.user!.id, params.id, body.name) })
  })
  router.delete('/studios/:id', teacher, async (req, res) => {
    await studios.deleteStudio(ctx, req.user!.id, parse(StudioIdParamsSchema, req, 'params').id)
    res.status(204).end()
  })
  router.delete('/studios/:id/students/:studentId', teacher, async (req, res) => {
    const { id, studentId } = parse(StudioStudentParamsSchema, req, 'params')
    await studios.removeStudent(ctx, req.user!.id, id, studentId)
    res.status(204).end()
  })
  router.post('/studios/:id/invitations', teacher, inviteLimit, async (req, res) => {
    const { params, body } = parseRequest(req, {
      params: StudioIdParamsSchema,
      body: InvitationInputSchema,
    })
    const result = await invite(ctx, req.user!.id, params.id, body.email)
    res.status(result.resent ? 200 : 201).json(result)
  })
  router.get('/invitations', teacher, async (req, res) => {
    res.json({
      invitations: await listInvitations(
        ctx,
        req.user!.id,
        parse(InvitationListQuerySchema, req, 'query'),
      ),
    })
  })
  router.post('/invitations/:id/resend', teacher, inviteLimit, async (req, res) => {
    const { id } = parse(InvitationIdParamsSchema, req, 'params')
    res.json({ invitation: await resendInvitation(ctx, req.user!.id, id) })
  })
  router.delete('/invitations/:id', teacher, async (req, res) => {
    const { id } = parse(InvitationIdParamsSchema, req, 'params')
    res.json({ invitation: await revokeInvitation(ctx, req.user!.id, id) })
  })
  router.get('/memberships', requireRole('student'), async (req, res) => {
    res.json({ memberships: await studios.membershipsOf(ctx, req.user!.id) })
  })
  router.delete('/memberships/:id', requireRole('student'), async (req, res) => {
    await studios.leaveStudio(ctx, req.user!.id, parse(StudioIdParamsSchema, req, 'params').id)
    res.status(204).end()
  })
}

/** The roster and one student's page, for teachers. */
function review(ctx: AppContext, router: Router) {
  const teacher = requireRole('teacher')
  router.get('/students', teacher, async (req, res) => {
    res.json({ students: await listTeacherStudents(ctx.db, req.user!.id) })
  })
  router.get('/roster', teacher, async (req, res) => {
    const query = parse(RosterQuerySchema, req, 'query')
    res.json(pageRoster(await rosterRows(ctx, req.user!.id), query))
  })
  router.get('/roster.csv', teacher, async (req, res) => {
    sendCsv(res, await rosterCsv(ctx, req.user!.id, parse(RosterExportQuerySchema, req, 'query')))
  })
  router.get('/students/:id', teacher, async (req, res) => {
    const { id } = parse(StudentIdParamsSchema, req, 'params')
    res.json({ student: await rosterRowOf(ctx, req.user!, id) })
  })
  router.get('/students/:id/assignments', teacher, async (req, res) => {
    const { id } = parse(StudentIdParamsSchema, req, 'params')
    res.json({ assignments: await studentAssignmentsForTeacher(ctx, req.user!, id) })
  })
  router.get('/students/:id/results.csv', teacher, async (req, res) => {
    const { params, query } = parseRequest(req, {
      params: StudentIdParamsSchema,
      query: ResultsExportQuerySchema,
    })
    sendCsv(res, await resultsCsv(ctx, req.user!, params.id, query))
  })
}

export function studioRoutes(ctx: AppContext): Router {
  const router = Router()
  router.use(requireAuth(ctx))
  studioManagement(ctx, router)
  review(ctx, router)
  return router
}
