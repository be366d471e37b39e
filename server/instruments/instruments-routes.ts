// /api/instruments: the signed-in user's saved instruments and the tuning presets.
import { Router } from 'express'
import { requireAuth } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { parse, parseRequest } from '../lib/validate'
import { InstrumentIdParamsSchema } from './instruments-schema'
import { InstrumentInputSchema, InstrumentPatchSchema } from '../../src/contract/instruments'
import {
  activateInstrument,
  createInstrument,
  listOrCreateInstruments,
  listPresets,
  patchInstrument,
  removeInstrument,
} from './instruments-service'

export function instrumentsRoutes(ctx: AppContext): Router {
  const router = Router()
  router.use(requireAuth(ctx))

  router.get('/presets', (_req, res) => {
    res.json({ presets: listPresets() })
  })

  router.get('/', async (req, res) => {
    res.json({ instruments: await listOrCreateInstruments(ctx, req.user!.id) })
  })

  router.post('/', async (req, res) => {
    const body = parse(InstrumentInputSchema, req)
    res.status(201).json({ instrument: await createInstrument(ctx, req.user!.id, body) })
  })

  router.patch('/:id', async (req, res) => {
    const { params, body } = parseRequest(req, {
      params: InstrumentIdParamsSchema,
      body: InstrumentPatchSchema,
    })
    res.json({ instrument: await patchInstrument(ctx, req.user!.id, params.id, body) })
  })

  router.delete('/:id', async (req, res) => {
    await removeInstrument(ctx, req.user!.id, parse(InstrumentIdParamsSchema, req, 'params').id)
    res.status(204).end()
  })

  router.post('/:id/activate', async (req, res) => {
    const { id } = parse(InstrumentIdParamsSchema, req, 'params')
    res.json({ instrument: await activateInstrument(ctx, req.user!.id, id) })
  })
  return router
}
