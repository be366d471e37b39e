// Every route of the app × seven callers: anonymous, the student, a classmate, a student of another
// studio, their teacher, another studio's teacher, an admin. The routes come from the app's own
// router stack: a route without a row here (or a row without a route) fails the first test.
import request from 'supertest'
import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { afterAll, beforeAll, expect, it } from 'vitest'
import { startTestApi, type TestApi } from '../helpers/api'
import { buildFixture, cookieFor, ROLES, type Fixture, type Role } from '../helpers/matrix-fixture'
import { ROWS, type Expected, type Send } from '../helpers/route-rows'
import { routeKey, routeTable } from '../helpers/route-table'

let api: TestApi
let dataDir: string
let f: Fixture

beforeAll(async () => {
  dataDir = mkdtempSync(path.join(tmpdir(), 'ambitus-route-matrix-'))
  // Limits high enough that seven callers per route never meet a rate limit (they have own tests).
  api = await startTestApi({
    dataDir,
    signupsPerHour: 10_000,
    mailSendsPerHour: 10_000,
    resetRequestsPerHour: 10_000,
  })
  f = await buildFixture(api)
})
afterAll(async () => {
  await api.close()
  rmSync(dataDir, { recursive: true, force: true })
})

async function call(method: string, send: Send, role: Role) {
  const cookie = await cookieFor(api, f, role)
  let req = request(api.app)[method.toLowerCase() as 'get'](send.path)
  if (cookie) req = req.set('Cookie', cookie)
  if (send.form) return (await send.form(req)).status
  return (await (send.body ? req.send(send.body) : req)).status
}

it('every route of the app has a row and every row names a route', () => {
  const routes = routeTable(api.bareApp).map(routeKey).sort()
  console.log(`route × role matrix: ${routes.length} routes × ${ROLES.length} callers`)
  expect(Object.keys(ROWS).sort()).toEqual(routes)
})

it.each(Object.entries(ROWS))('%s answers each caller as the rules say', async (key, row) => {
  const [method] = key.split(' ') as [string]
  const [build, expected] = row
  const order = [...ROLES].sort((a, b) => Number(expected[a] < 300) - Number(expected[b] < 300))
  const actual = {} as Expected
  for (const role of order) actual[role] = await call(method, build(f), role)
  expect(actual).toEqual(expected)
})
