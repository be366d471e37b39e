// /api/studio/roster (paged, sorted, filtered; and as CSV), /api/studio/students (one row per
// membership, a contract outside checks use) and a student's page: row, plans, results as CSV.
import { Router, type Response } from 'express'
import { requireAuth, requireRole } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { parse, parseRequest } from '../lib/validate'
import { studentAssignmentsForTeacher } from '../plans/assigned-plans'
import { rosterCsv } from './roster-export'
import { resultsCsv } from './results-export'
import { pageRoster } from './roster-query'
import {
  ResultsExportQuerySchema,
  RosterExportQuerySchema,
  RosterQuerySchema,
  StudentIdParamsSchema,
} from './roster-schema'
import { rosterRowOf, rosterRows, teacherStudentList } from './roster-service'

function sendCsv(res: Response, file: { fileName: string; csv: string }) {
  res
    .type('text/csv; charset=utf-8')
    .attachment(file.fileName)
    .set('Cache-Control', 'no-store')
    .send(file.csv)
}

function studentRoutes(ctx: AppContext, router: Router) {
  router.get('/', async (req, res) => {
    res.json({ students: await teacherStudentList(ctx, req.user!.id) })
  })
  router.get('/:id', async (req, res) => {
    const { id } = parse(StudentIdParamsSchema, req, 'params')
    res.json({ student: await rosterRowOf(ctx, req.user!, id) })
  })
  router.get('/:id/assignments', async (req, res) => {
    const { id } = parse(StudentIdParamsSchema, req, 'params')
    res.json({ assignments: await studentAssignmentsForTeacher(ctx, req.user!, id) })
  })
  router.get('/:id/results.csv', async (req, res) => {
    const { params, query } = parseRequest(req, {
      params: StudentIdParamsSchema,
      query: ResultsExportQuerySchema,
    })
    sendCsv(res, await resultsCsv(ctx, req.user!, params.id, query))
  })
}

export function mountRoster(api: Router, ctx: AppContext) {
  const teacher = [requireAuth(ctx), requireRole('teacher')]
  // roster and roster.csv share the /studio prefix with other features: each route is guarded
  api.get('/studio/roster', ...teacher, async (req, res) => {
    const query = parse(RosterQuerySchema, req, 'query')
    res.json(pageRoster(await rosterRows(ctx, req.user!.id), query))
  })
  api.get('/studio/roster.csv', ...teacher, async (req, res) => {
    const filter = parse(RosterExportQuerySchema, req, 'query')
    sendCsv(res, await rosterCsv(ctx, req.user!.id, filter))
  })
  const students = Router()
  students.use(...teacher)
  studentRoutes(ctx, students)
  api.use('/studio/students', students)
}
