// The plan_comments table.
import type { Db } from '../lib/db'
import type { PlanComment } from '../../src/contract/assignments'

interface CommentRow {
  id: string
  assignment_id: string
  author_id: string
  author_name: string
  author_role: string
  body: string
  created_at: Date
}

const toComment = (r: CommentRow): PlanComment => ({
  id: r.id,
  assignmentId: r.assignment_id,
  author: {
    id: r.author_id,
    name: r.author_name,
    role: r.author_role === 'teacher' ? 'teacher' : 'student',
  },
  body: r.body,
  createdAt: r.created_at.toISOString(),
})

const commentQuery = (db: Db) =>
  db('plan_comments as c')
    .join('users as u', 'u.id', 'c.author_id')
    .select('c.*', 'u.name as author_name', 'u.role as author_role')

export async function listComments(db: Db, assignmentId: string): Promise<PlanComment[]> {
  const rows: CommentRow[] = await commentQuery(db)
    .where('c.assignment_id', assignmentId)
    .orderBy('c.created_at')
  return rows.map(toComment)
}

export async function insertComment(
  db: Db,
  assignmentId: string,
  authorId: string,
  body: string,
): Promise<PlanComment> {
  const [row] = await db('plan_comments')
    .insert({ assignment_id: assignmentId, author_id: authorId, body })
    .returning('id')
  const created = (await commentQuery(db)
    .where('c.id', (row as { id: string }).id)
    .first()) as CommentRow
  return toComment(created)
}

export async function findComment(db: Db, id: string): Promise<PlanComment | null> {
  const row = (await commentQuery(db).where('c.id', id).first()) as CommentRow | undefined
  return row ? toComment(row) : null
}

export async function deleteComment(db: Db, id: string) {
  await db('plan_comments').where({ id }).delete()
}
