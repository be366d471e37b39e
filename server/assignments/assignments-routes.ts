// /api/assignments/:id/…: the comment thread and the recordings of one assigned plan.
import { Router } from 'express'
import { requireAuth } from '../auth/auth-middleware'
import type { AppContext } from '../context'
import { mailLimit } from '../lib/rate-limits'
import { parse, parseRequest } from '../lib/validate'
import { CommentInputSchema } from '../../src/contract/assignments'
import { AssignmentIdParamsSchema, CommentIdParamsSchema } from './assignments-schema'
import { postComment, removeComment, threadOf } from './comments-service'
import { recordingRoutes } from './recording-routes'

export function mountAssignments(api: Router, ctx: AppContext) {
  const router = Router()
  router.use(requireAuth(ctx))
  commentRoutes(ctx, router)
  recordingRoutes(ctx, router)
  api.use('/assignments', router)
}

function commentRoutes(ctx: AppContext, router: Router) {
  router.get('/:id/comments', async (req, res) => {
    const { id } = parse(AssignmentIdParamsSchema, req, 'params')
    res.json({ comments: await threadOf(ctx, req.user!, id) })
  })
  router.post('/:id/comments', mailLimit(ctx, 'comment'), async (req, res) => {
    const { params, body } = parseRequest(req, {
      params: AssignmentIdParamsSchema,
      body: CommentInputSchema,
    })
    res.status(201).json({ comment: await postComment(ctx, req.user!, params.id, body.body) })
  })
  router.delete('/:id/comments/:commentId', async (req, res) => {
    const { id, commentId } = parse(CommentIdParamsSchema, req, 'params')
    await removeComment(ctx, req.user!, id, commentId)
    res.status(204).end()
  })
}
