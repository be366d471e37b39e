// The Recordings page as a student (issue 16 item 6): free takes say who hears them, the take's
// sharing changes from a menu, and a reference made for the student is labelled as the teacher's.
import { flushPromises } from '@vue/test-utils'
import { afterEach, describe, expect, it, vi } from 'vitest'
import { mountRoute } from '../helpers/mount'
import { stubApi } from './drill-test-kit'

afterEach(() => {
  vi.unstubAllGlobals()
  document.body.innerHTML = ''
})

const ME = { id: 'u-student', name: 'Wren' }
const TEACHER = { id: 'u-teacher', name: 'Marta Ilves' }
const entry = (over: Record<string, unknown>) => ({
  id: 'r1',
  planItemId: null,
  kind: 'take',
  title: 'Walking line in F',
  mimeType: 'audio/wav',
  sizeBytes: 32_000,
  originalName: 'take.wav',
  createdAt: '2026-12-03T10:00:00Z',
  durationMs: 2000,
  student: ME,
  author: ME,
  sharedWith: null,
  planItem: null,
  commentCount: 0,
  ...over,
})

describe('RecordingsView as a student', () => {
  it('when a private take is shared from its menu, then the change is sent and the take says who hears it', async () => {
    const api = stubApi({
      'GET /api/auth/me': {
        user: { ...ME, email: 'w@example.test', role: 'student', createdAt: '' },
      },
      'GET /api/recordings': {
        recordings: [
          entry({}),
          entry({ id: 'r2', kind: 'reference', title: 'How it swings', author: TEACHER }),
        ],
      },
      'GET /api/recordings/teachers': { teachers: [TEACHER] },
      'PATCH /api/recordings/r1': { recording: entry({ sharedWith: TEACHER }) },
    })
    const { wrapper } = await mountRoute('/recordings', { attachTo: document.body })
    await flushPromises()
    const take = wrapper.find('[data-testid="take-r1"]')
    expect(take.text()).toContain('Only you can hear it')
    const reference = wrapper.find('[data-testid="take-r2"]')
    expect(reference.text()).toContain('Reference from Marta Ilves')
    expect(reference.text()).toContain('Made for you')
    expect(reference.find('[aria-label^="Who hears"]').exists()).toBe(false)
    expect(reference.find('[aria-label^="Delete"]').exists()).toBe(false)
    await take.find('[aria-label="Who hears Walking line in F"]').trigger('click')
    await flushPromises()
    const choice = [...document.querySelectorAll('.v-list-item')].find((el) =>
      el.textContent?.includes('Share with Marta Ilves'),
    ) as HTMLElement
    choice.click()
    await flushPromises()
    expect(api.sent('PATCH', '/api/recordings/r1').map((r) => r.body)).toEqual([
      { shareWith: TEACHER.id },
    ])
    expect(wrapper.find('[data-testid="take-r1"]').text()).toContain('Shared with Marta Ilves')
  })
})
