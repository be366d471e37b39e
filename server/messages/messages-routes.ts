// /api/messages: a teacher's messages to students (with who has read them); a student's inbox.
import { Router } from 'express'
import { requireAuth, requireRole } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { mailLimit } from '../lib/rate-limits'
import { parse } from '../lib/validate'
import { MessageCreateSchema } from '../../src/contract/messages'
import { MessageIdParamsSchema } from './messages-schema'
import * as messages from './messages-service'

const sendsMail = (req: { body?: { email?: unknown } }) => req.body?.email !== false

export function messageRoutes(ctx: AppContext): Router {
  const router = Router()
  router.use(requireAuth(ctx))
  const teacher = requireRole('teacher')
  router.get('/', requireRole('teacher', 'student'), async (req, res) => {
    res.json({ messages: await messages.messagesFor(ctx, req.user!) })
  })
  router.post('/', teacher, mailLimit(ctx, 'messages', sendsMail), async (req, res) => {
    const input = parse(MessageCreateSchema, req)
    res.status(201).json({ message: await messages.sendMessage(ctx, req.user!, input) })
  })
  router.post('/:id/read', requireRole('student'), async (req, res) => {
    const { id } = parse(MessageIdParamsSchema, req, 'params')
    res.json({ message: await messages.markRead(ctx, req.user!, id) })
  })
  router.delete('/:id', teacher, async (req, res) => {
    await messages.removeMessage(ctx, req.user!, parse(MessageIdParamsSchema, req, 'params').id)
    res.status(204).end()
  })
  return router
}
