// /api/worksheets: printable PDFs for signed-in players and teachers (neck, cycle, scatter, runs, chords).
import { Router, type Response } from 'express'
import { requireAuth } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { parse } from '../lib/validate'
import {
  ChordsQuerySchema,
  CycleQuerySchema,
  NeckQuerySchema,
  RunsQuerySchema,
  ScatterQuerySchema,
} from '../../src/contract/worksheets'
import {
  chordsWorksheet,
  cycleWorksheet,
  neckWorksheet,
  runsWorksheet,
  scatterWorksheet,
  type Worksheet,
} from './worksheets-service'

function sendPdf(res: Response, sheet: Worksheet) {
  res
    .type('application/pdf')
    .set('Content-Disposition', `attachment; filename="${sheet.fileName}"`)
    .set('Cache-Control', 'private, no-store')
    .send(sheet.pdf)
}

export function worksheetRoutes(ctx: AppContext): Router {
  const router = Router()
  router.use(requireAuth(ctx))

  router.get('/neck.pdf', async (req, res) => {
    sendPdf(res, await neckWorksheet(parse(NeckQuerySchema, req, 'query')))
  })

  router.get('/cycle.pdf', async (req, res) => {
    sendPdf(res, await cycleWorksheet(parse(CycleQuerySchema, req, 'query')))
  })

  router.get('/scatter.pdf', async (req, res) => {
    sendPdf(res, await scatterWorksheet(parse(ScatterQuerySchema, req, 'query')))
  })

  router.get('/runs.pdf', async (req, res) => {
    sendPdf(res, await runsWorksheet(parse(RunsQuerySchema, req, 'query')))
  })

  router.get('/chords.pdf', async (req, res) => {
    sendPdf(res, await chordsWorksheet(parse(ChordsQuerySchema, req, 'query')))
  })
  return router
}
