// Studios, their members, and the roster figures read from attempts.
import type { Db } from '../lib/db'
import type { StudioStudent } from './studio-schema'

interface RosterRow {
  id: string
  name: string
  email: string
  studio_id: string
  studio_name: string
  joined_at: Date
  last_practice_at: Date | null
  correct: string | null
  total: string | null
}

/** Every student in the teacher's studios, with last practice and overall accuracy. */
export async function listTeacherStudents(db: Db, teacherId: string): Promise<StudioStudent[]> {
  const rows: RosterRow[] = await db('studios as s')
    .join('studio_members as m', 'm.studio_id', 's.id')
    .join('users as u', 'u.id', 'm.student_id')
    .leftJoin(
      db('attempts')
        .select('user_id')
        .max({ last_practice_at: 'created_at' })
        .count({ total: '*' })
        .sum({ correct: db.raw('correct::int') })
        .groupBy('user_id')
        .as('a'),
      'a.user_id',
      'u.id',
    )
    .where('s.teacher_id', teacherId)
    .select('u.id', 'u.name', 'u.email', 's.id as studio_id', 's.name as studio_name', 'm.joined_at')
    .select('a.last_practice_at', 'a.correct', 'a.total')
    .orderBy('u.name')
  return rows.map((r) => ({
    id: r.id,
    name: r.name,
    email: r.email,
    studioId: r.studio_id,
    studioName: r.studio_name,
    joinedAt: r.joined_at.toISOString(),
    lastPracticeAt: r.last_practice_at ? r.last_practice_at.toISOString() : null,
    accuracy: r.total && Number(r.total) > 0 ? Number(r.correct) / Number(r.total) : null,
  }))
}
