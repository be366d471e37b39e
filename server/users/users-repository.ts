// Users table access: the only place that knows its columns.
import type { Db } from '../lib/db'
import type { TimeZoneSetting } from '../../src/contract/account'
import type { AdminUser, PublicUser, Role, UserListQuery } from './users-schema'

export interface UserRecord extends PublicUser {
  passwordHash: string
  passwordChangedAt: Date
  disabledAt: Date | null
}

export interface UserRow {
  id: string
  email: string
  name: string
  role: Role
  password_hash: string
  password_changed_at: Date
  disabled_at: Date | null
  created_at: Date
  updated_at: Date
}

export const toRecord = (row: UserRow): UserRecord => ({
  id: row.id,
  email: row.email,
  name: row.name,
  role: row.role,
  createdAt: row.created_at.toISOString(),
  passwordHash: row.password_hash,
  passwordChangedAt: row.password_changed_at,
  disabledAt: row.disabled_at,
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

/** What an admin sees of an account: the public fields and whether it is disabled. */
export const toAdminUser = (user: UserRecord): AdminUser => ({
  ...toPublicUser(user),
  disabledAt: user.disabledAt ? user.disabledAt.toISOString() : null,
})

export async function updateRole(db: Db, id: string, role: Role): Promise<UserRecord | null> {
  const [row] = await db<UserRow>('users')
    .where({ id })
    .update({ role, updated_at: new Date() })
    .returning('*')
  return row ? toRecord(row) : null
}

/** Disables (sign-in refused) or re-enables an account. */
export async function updateDisabled(
  db: Db,
  id: string,
  disabled: boolean,
): Promise<UserRecord | null> {
  const [row] = await db<UserRow>('users')
    .where({ id })
    .update({ disabled_at: disabled ? db.fn.now() : null, updated_at: new Date() })
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
  return { total: Number(count), items: rows.map((r) => toAdminUser(toRecord(r))) }
}

/** Each user's IANA time zone (the one their browser last sent; UTC when none yet), for e-mails. */
export async function timeZonesOf(db: Db, userIds: string[]): Promise<Map<string, string>> {
  const rows: { user_id: string; time_zone: string }[] = userIds.length
    ? await db('user_time_zones').whereIn('user_id', userIds).select('user_id', 'time_zone')
    : []
  const zones = new Map(rows.map((r) => [r.user_id, r.time_zone]))
  return new Map(userIds.map((id) => [id, zones.get(id) ?? 'UTC']))
}

/** One user's time zone (see timeZonesOf). */
export const timeZoneOf = async (db: Db, userId: string) =>
  (await timeZonesOf(db, [userId])).get(userId) ?? 'UTC'

/** The user's zone and whether it follows the browser (a user with none yet follows it, in UTC). */
export async function timeZoneSetting(db: Db, userId: string): Promise<TimeZoneSetting> {
  const row = (await db('user_time_zones').where('user_id', userId).first()) as
    { time_zone: string; chosen_at: Date | null } | undefined
  return { timeZone: row?.time_zone ?? 'UTC', followsBrowser: !row?.chosen_at }
}

/** Saves the zone the user chose in Account (or follows the browser again with its zone). */
export async function chooseTimeZone(
  db: Db,
  userId: string,
  zone: string,
  followsBrowser: boolean,
) {
  await db('user_time_zones')
    .insert({
      user_id: userId,
      time_zone: zone,
      chosen_at: followsBrowser ? null : db.fn.now(),
      updated_at: db.fn.now(),
    })
    .onConflict('user_id')
    .merge(['time_zone', 'chosen_at', 'updated_at'])
}

/** Saves the browser's zone unless the user chose one (the practice batches report it too). */
export async function reportBrowserTimeZone(db: Db, userId: string, zone: string) {
  await db('user_time_zones')
    .insert({ user_id: userId, time_zone: zone, updated_at: db.fn.now() })
    .onConflict('user_id')
    .merge(['time_zone', 'updated_at'])
    .whereRaw(
      'user_time_zones.chosen_at is null and user_time_zones.time_zone is distinct from excluded.time_zone',
    )
}

/** Whether PostgreSQL knows a time zone name (its list can differ slightly from the JS runtime's). */
export async function isKnownTimeZone(db: Db, zone: string) {
  const row = await db('pg_timezone_names').where('name', zone).first('name')
  return row !== undefined
}
