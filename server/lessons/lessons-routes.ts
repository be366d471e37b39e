// /api/lessons: the teacher's lesson schedule with notes (students read their own, shared notes
// only), the iCalendar export, and "since the last lesson".
import { Router } from 'express'
import { requireAuth, requireRole } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { parse, parseRequest } from '../lib/validate'
import {
  LessonCreateSchema,
  LessonNoteInputSchema,
  LessonUpdateSchema,
} from '../../src/contract/lessons'
import {
  LessonIdParamsSchema,
  LessonListQuerySchema,
  LessonNoteParamsSchema,
  SinceQuerySchema,
} from './lessons-schema'
import { lessonsCalendar } from './lessons-ics'
import * as lessons from './lessons-service'

export function lessonRoutes(ctx: AppContext): Router {
  const router = Router()
  router.use(requireAuth(ctx))
  const teacher = requireRole('teacher')
  router.get('/', async (req, res) => {
    const { student } = parse(LessonListQuerySchema, req, 'query')
    res.json({ lessons: await lessons.lessonsFor(ctx, req.user!, student) })
  })
  router.get('/calendar.ics', async (req, res) => {
    const list = await lessons.lessonsFor(ctx, req.user!)
    res.set('Content-Type', 'text/calendar; charset=utf-8')
    res.set('Content-Disposition', 'attachment; filename="ambitus-lessons.ics"')
    res.send(lessonsCalendar(ctx.config, list, req.user!.role === 'teacher'))
  })
  router.get('/since-last', async (req, res) => {
    const { student } = parse(SinceQuerySchema, req, 'query')
    res.json({ since: await lessons.sinceLastLesson(ctx, req.user!, student) })
  })
  router.post('/', teacher, async (req, res) => {
    const input = parse(LessonCreateSchema, req)
    res.status(201).json({ lessons: await lessons.scheduleLessons(ctx, req.user!, input) })
  })
  router.patch('/:id', teacher, async (req, res) => {
    const { params, body } = parseRequest(req, {
      params: LessonIdParamsSchema,
      body: LessonUpdateSchema,
    })
    res.json({ lesson: await lessons.changeLesson(ctx, req.user!, params.id, body) })
  })
  router.delete('/:id', teacher, async (req, res) => {
    await lessons.removeLesson(ctx, req.user!, parse(LessonIdParamsSchema, req, 'params').id)
    res.status(204).end()
  })
  router.post('/:id/notes', teacher, async (req, res) => {
    const { params, body } = parseRequest(req, {
      params: LessonIdParamsSchema,
      body: LessonNoteInputSchema,
    })
    res.status(201).json({ lesson: await lessons.addNote(ctx, req.user!, params.id, body) })
  })
  router.delete('/:id/notes/:noteId', teacher, async (req, res) => {
    const { id, noteId } = parse(LessonNoteParamsSchema, req, 'params')
    res.json({ lesson: await lessons.removeNote(ctx, req.user!, id, noteId) })
  })
  return router
}
