// Users table access: the only place that knows its columns.
import type { Db } from '../lib/db'
import type { PublicUser, Role, UserListQuery } from './users-schema'

export interface UserRecord extends PublicUser {
  passwordHash: string
  passwordChangedAt: Date
}

interface UserRow {
  id: string
  email: string
  name: string
  role: Role
  password_hash: string
  password_changed_at: Date
  created_at: Date
  updated_at: Date
}

const toRecord = (row: UserRow): UserRecord => ({
  id: row.id,
  email: row.email,
  name: row.name,
  role: row.role,
  createdAt: row.created_at.toISOString(),
  passwordHash: row.password_hash,
  passwordChangedAt: row.password_changed_at,
})

/** Strips the secret fields before a user leaves the server. */
export const toPublicUser = ({ id, email, name, role, createdAt }: UserRecord): PublicUser => ({
  id,
  email,
  name,
  role,
  createdAt,
})

export async function findUserByEmail(db: Db, email: string): Promise<UserRecord | null> {
  const row = await db<UserRow>('users').where({ email }).first()
  return row ? toRecord(row) : null
}

export async function findUserById(db: Db, id: string): Promise<UserRecord | null> {
  const row = await db<UserRow>('users').where({ id }).first()
  return row ? toRecord(row) : null
}

export async function insertUser(
  db: Db,
  user: { email: string; name: string; role: Role; passwordHash: string },
): Promise<UserRecord> {
  const [row] = await db<UserRow>('users')
    .insert({
      email: user.email,
      name: user.name,
      role: user.role,
      password_hash: user.passwordHash,
    })
    .returning('*')
  return toRecord(row as UserRow)
}

export async function updatePassword(db: Db, id: string, passwordHash: string): Promise<Date> {
  const [row] = await db<UserRow>('users')
    .where({ id })
    .update({
      password_hash: passwordHash,
      password_changed_at: new Date(),
      updated_at: new Date(),
    })
    .returning('password_changed_at')
  return (row as UserRow).password_changed_at
}

export async function updateRole(db: Db, id: string, role: Role): Promise<UserRecord | null> {
  const [row] = await db<UserRow>('users')
    .where({ id })
    .update({ role, updated_at: new Date() })
    .returning('*')
  return row ? toRecord(row) : null
}

export async function listUsers(db: Db, query: UserListQuery) {
  const base = db<UserRow>('users').modify((q) => {
    if (query.role) q.where('role', query.role)
    if (query.search) {
      const like = `%${query.search.replace(/[%_\\]/g, '\\$&')}%`
      q.where((w) => w.whereILike('email', like).orWhereILike('name', like))
    }
  })
  const [{ count }] = (await base.clone().count({ count: '*' })) as [{ count: string }]
  const rows: UserRow[] = await base
    .clone()
    .orderBy('created_at', 'desc')
    .orderBy('id')
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize)
  return { total: Number(count), items: rows.map((r) => toPublicUser(toRecord(r))) }
}
