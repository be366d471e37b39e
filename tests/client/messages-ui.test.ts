// Issue 16 item 4 in the page: the teacher writes to chosen students and sees who has read it; a
// student opening an unread message marks it read.
import { flushPromises } from '@vue/test-utils'
import { afterEach, describe, expect, it, vi } from 'vitest'
import { mountRoute } from '../helpers/mount'
import { stubApi } from './drill-test-kit'

afterEach(() => {
  vi.unstubAllGlobals()
  document.body.innerHTML = ''
})

const user = (role: string) => ({
  user: { id: 'u1', email: 'x@example.test', name: 'X', role, createdAt: '' },
})
const SENT = {
  id: 'm1',
  subject: 'Recital',
  body: 'Bring your tuner.',
  audience: 'students',
  studioName: null,
  emailed: true,
  createdAt: '2026-12-03T10:00:00Z',
  recipients: [
    { studentId: 's1', name: 'Ada', readAt: '2026-12-03T11:00:00Z' },
    { studentId: 's2', name: 'Ben', readAt: null },
  ],
}
const RECEIVED = {
  id: 'm1',
  subject: 'Recital',
  body: 'Bring your tuner.',
  teacherName: 'Mira',
  studioName: 'Cedar Hollow',
  createdAt: '2026-12-03T10:00:00Z',
  readAt: null,
}

describe('MessagesView', () => {
  it('when the teacher opens Messages, then each sent message says who has read it', async () => {
    stubApi({
      'GET /api/auth/me': user('teacher'),
      'GET /api/messages': { messages: [SENT] },
      'GET /api/studio/studios': { studios: [] },
      'GET /api/studio/students': { students: [] },
    })
    const { wrapper } = await mountRoute('/messages')
    await flushPromises()
    const sent = wrapper.find('[data-testid="sent-message"]')
    expect(sent.find('[data-testid="read-summary"]').text()).toBe('Read by 1 of 2')
    expect(sent.find('[data-testid="recipient-Ada"]').text()).toContain('read ')
    expect(sent.find('[data-testid="recipient-Ben"]').text()).toContain('not read yet')
  })

  it('when the teacher sends without choosing anyone, then the server’s field error shows under To', async () => {
    stubApi({
      'GET /api/auth/me': user('teacher'),
      'GET /api/messages': { messages: [] },
      'GET /api/studio/studios': { studios: [] },
      'GET /api/studio/students': { students: [] },
    })
    const fetch = vi.mocked(globalThis.fetch)
    const fallback = fetch.getMockImplementation()!
    const posted: unknown[] = []
    fetch.mockImplementation(async (input, init) =>
      init?.method === 'POST' && posted.push(JSON.parse(String(init.body)))
        ? new Response(
            JSON.stringify({
              error: {
                code: 'validation',
                message: 'Check the fields.',
                fields: { 'to.studentIds': ['Choose at least one student.'] },
              },
            }),
            { status: 400, headers: { 'content-type': 'application/json' } },
          )
        : fallback(input, init),
    )
    const { wrapper } = await mountRoute('/messages')
    await flushPromises()
    const composer = wrapper.find('[data-testid="message-composer"]')
    await composer.find('input[name="subject"]').setValue('Recital')
    await composer.find('textarea[name="body"]').setValue('Bring your tuner.')
    await composer.find('form').trigger('submit')
    await flushPromises()
    expect(composer.text()).toContain('Choose at least one student.')
    expect(posted).toEqual([
      {
        to: { kind: 'students', studentIds: [] },
        subject: 'Recital',
        body: 'Bring your tuner.',
        email: true,
      },
    ])
  })

  it('when a student opens an unread message, then it is marked read once and loses its New chip', async () => {
    const api = stubApi({
      'GET /api/auth/me': user('student'),
      'GET /api/messages': { messages: [RECEIVED] },
      'POST /api/messages/m1/read': { message: { ...RECEIVED, readAt: '2026-12-03T12:00:00Z' } },
    })
    const { wrapper } = await mountRoute('/messages')
    await flushPromises()
    const item = wrapper.find('[data-testid="received-message"]')
    expect(item.text()).toContain('New')
    await item.find('.v-expansion-panel-title').trigger('click')
    await flushPromises()
    expect(api.sent('POST', '/api/messages/m1/read')).toHaveLength(1)
    expect(wrapper.find('[data-testid="received-message"]').text()).not.toContain('New')
    expect(wrapper.find('[data-testid="received-message"]').text()).toContain('Bring your tuner.')
  })
})
