// Finding 4 as the attack: an admin reads the mail log to pick up live reset and invitation links.
// The admin API shows that a link was sent, never the link; `npm run mail:show` prints raw mail.
import { execFile } from 'node:child_process'
import { promisify } from 'node:util'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { maskLinks } from '../../server/admin/mail-mask'
import {
  signedInAdmin,
  signedInAgent,
  startTestApi,
  uniqueEmail,
  waitForMail,
  type TestApi,
} from '../helpers/api'
import { teacherWithStudio } from '../helpers/studio'

let api: TestApi
let admin: Awaited<ReturnType<typeof signedInAgent>>
beforeAll(async () => {
  api = await startTestApi()
  admin = await signedInAdmin(api.app, 'Log Reader')
})
afterAll(() => api.close())

/** The token in the raw mail (read from the table, as tests and developers may). */
const tokenIn = (text: string) => /token=([A-Za-z0-9_%-]+)/.exec(text)![1]!

async function adminView(address: string) {
  const list = await admin.agent.get('/api/admin/mail').query({ search: address })
  const opened = await admin.agent.get(`/api/admin/mail/${list.body.items[0].id}`)
  return { list: list.text, opened }
}

describe('the admin mail log', () => {
  it('when a reset link was mailed, then the admin sees that it was sent but not the token', async () => {
    const someone = await signedInAgent(api.app)
    await request(api.app).post('/api/auth/password-reset').send({ email: someone.email })
    const raw = await waitForMail(api.ctx, someone.email)
    const token = tokenIn(raw.text)

    const { list, opened } = await adminView(someone.email)
    expect(opened.status).toBe(200)
    expect(opened.body.message.text).toContain('[link to /reset-password (hidden)]')
    expect(opened.text).not.toContain(token)
    expect(list).not.toContain(token)
  })

  it('when an invitation was mailed, then its accept link is hidden too and the admin cannot use it', async () => {
    const teacher = await teacherWithStudio(api.app)
    const email = uniqueEmail('invited')
    await teacher.agent.post(`/api/studio/studios/${teacher.studioId}/invitations`).send({ email })
    const raw = await waitForMail(api.ctx, email)
    const token = decodeURIComponent(tokenIn(raw.text))

    const { opened } = await adminView(email)
    expect(opened.body.message.text).toContain('[link to /invitations/accept (hidden)]')
    expect(opened.text).not.toContain(token)
    expect(opened.text).not.toContain(encodeURIComponent(token))
  })

  it('when a developer runs mail:show, then the raw message with its link is printed', async () => {
    const someone = await signedInAgent(api.app)
    await request(api.app).post('/api/auth/password-reset').send({ email: someone.email })
    const token = tokenIn((await waitForMail(api.ctx, someone.email)).text)
    const { stdout } = await promisify(execFile)(
      process.execPath,
      ['--import', 'tsx', 'scripts/mail-show.ts', '--to', someone.email, '--last', '1'],
      { env: { ...process.env, DATABASE_URL: api.ctx.config.databaseUrl } },
    )
    expect(stdout).toContain(`Subject: Reset your Ambitus password`)
    expect(stdout).toContain(`/reset-password?token=${token}`)
  })
})

describe('which links are hidden', () => {
  it.each([
    ['https://ambitus.test/reset-password?token=abc', '[link to /reset-password (hidden)]'],
    [
      'http://127.0.0.1:3000/invitations/accept?token=x%2By',
      '[link to /invitations/accept (hidden)]',
    ],
    ['https://ambitus.test/s/AbCdEfGhIjKlMnOpQrStUv12', '[link to /s/… (hidden)]'],
    ['https://ambitus.test/login#access=secret', '[link to /login (hidden)]'],
  ])('%s → %s', (link, shown) => {
    expect(maskLinks(`Open ${link} now`)).toBe(`Open ${shown} now`)
  })

  it('when a link carries no secret, then it stays readable', () => {
    const text = 'See https://ambitus.test/studio and https://ambitus.test/plans/week-2'
    expect(maskLinks(text)).toBe(text)
  })
})
