// /api/progress: a student's statistics (own by default; `student=` for their teachers and admins).
import { Router } from 'express'
import type { z } from 'zod'
import { requireAuth } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { parse } from '../lib/validate'
import type { PublicUser } from '../users/users-schema'
import * as schemas from './progress-schema'
import * as progress from './progress-service'

type Reader<S extends z.ZodType> = (
  ctx: AppContext,
  viewer: PublicUser,
  query: z.infer<S>,
) => Promise<unknown>

export function progressRoutes(ctx: AppContext): Router {
  const router = Router()
  router.use(requireAuth(ctx))
  // Every statistic is a GET whose query one schema checks, answered by one service function.
  const read = <S extends z.ZodType>(path: string, schema: S, reader: Reader<S>) =>
    router.get(path, async (req, res) => {
      res.json(await reader(ctx, req.user!, parse(schema, req, 'query')))
    })

  read('/summary', schemas.RangeQuerySchema, progress.summary)
  read('/positions', schemas.ProgressScopeSchema, progress.positions)
  read('/notes', schemas.ProgressScopeSchema, progress.notes)
  read('/timeline', schemas.RangeQuerySchema, progress.timeline)
  read('/tempos', schemas.RangeQuerySchema, progress.tempos)
  read('/fingerings', schemas.FingeringsQuerySchema, progress.fingerings)
  read('/cycle-position', schemas.CyclePositionQuerySchema, progress.cyclePosition)
  read('/chords', schemas.ChordTonesQuerySchema, progress.chordTones)
  return router
}
