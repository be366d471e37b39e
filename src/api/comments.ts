// /api/assignments/:id/comments endpoints: the thread of one assigned plan.
import type { PlanComment } from '../contract/assignments'
import { http } from './http'

export type { PlanComment }

export const listComments = (assignmentId: string) =>
  http.get<{ comments: PlanComment[] }>(`/assignments/${assignmentId}/comments`)
export const postComment = (assignmentId: string, body: string) =>
  http.post<{ comment: PlanComment }>(`/assignments/${assignmentId}/comments`, { body })
export const deleteComment = (assignmentId: string, commentId: string) =>
  http.delete<void>(`/assignments/${assignmentId}/comments/${commentId}`)
