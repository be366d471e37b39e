// The building blocks of the route × role matrix rows: what one call sends and the status each
// caller must get.
import type { Test } from 'supertest'
import { ROLES, type Fixture, type Role } from './matrix-fixture'

export type Expected = Record<Role, number>
/** What one call sends: the path with ids filled in, a JSON body or a multipart form. */
export interface Send {
  path: string
  body?: object
  form?: (t: Test) => Test
}
export type Row = [(f: Fixture) => Send, Expected]

export const all = (status: number): Expected =>
  Object.fromEntries(ROLES.map((r) => [r, status])) as Expected
export const signedIn = (status: number) => ({ ...all(status), anonymous: 401 })
/** 401 for anonymous, `denied` for everyone else but the ones named. */
export const only = (ok: Partial<Expected>, denied = 403): Expected => ({
  ...all(denied),
  anonymous: 401,
  ...ok,
})
export const teachers = (ok: number, otherTeacher = 403) => only({ teacher: ok, otherTeacher })
export const students = (ok: number) => only({ student: ok, classmate: ok, outsider: ok })
/** A student's own data, read by a teacher of theirs or an admin; refused to everyone else. */
export const studentData = only({ student: 200, teacher: 200, admin: 200 })

export const get = (p: (f: Fixture) => string) => (f: Fixture) => ({ path: p(f) })
export const send = (p: (f: Fixture) => string, body: (f: Fixture) => object) => (f: Fixture) => ({
  path: p(f),
  body: body(f),
})
