// /api/progress: a student's statistics (own by default; `student=` for their teachers and admins).
import { Router } from 'express'
import { requireAuth } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { parse } from '../lib/validate'
import {
  ChordTonesQuerySchema,
  CyclePositionQuerySchema,
  FingeringsQuerySchema,
  ProgressScopeSchema,
  RangeQuerySchema,
} from './progress-schema'
import {
  chordTones,
  cyclePosition,
  fingerings,
  notes,
  positions,
  summary,
  tempos,
  timeline,
} from './progress-service'

export function progressRoutes(ctx: AppContext): Router {
  const router = Router()
  router.use(requireAuth(ctx))

  router.get('/summary', async (req, res) => {
    res.json(await summary(ctx, req.user!, parse(RangeQuerySchema, req, 'query')))
  })

  router.get('/positions', async (req, res) => {
    res.json(await positions(ctx, req.user!, parse(ProgressScopeSchema, req, 'query')))
  })

  router.get('/notes', async (req, res) => {
    res.json(await notes(ctx, req.user!, parse(ProgressScopeSchema, req, 'query')))
  })

  router.get('/timeline', async (req, res) => {
    res.json(await timeline(ctx, req.user!, parse(RangeQuerySchema, req, 'query')))
  })

  router.get('/tempos', async (req, res) => {
    res.json(await tempos(ctx, req.user!, parse(RangeQuerySchema, req, 'query')))
  })

  router.get('/fingerings', async (req, res) => {
    res.json(await fingerings(ctx, req.user!, parse(FingeringsQuerySchema, req, 'query')))
  })

  router.get('/cycle-position', async (req, res) => {
    res.json(await cyclePosition(ctx, req.user!, parse(CyclePositionQuerySchema, req, 'query')))
  })

  router.get('/chords', async (req, res) => {
    res.json(await chordTones(ctx, req.user!, parse(ChordTonesQuerySchema, req, 'query')))
  })

  return router
}
