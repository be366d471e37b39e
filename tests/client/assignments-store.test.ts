// The comment thread of an assigned plan: a comment sent while the thread is still loading stays when
// the (older) load answers last, as happens on a busy connection.
import { createPinia, setActivePinia } from 'pinia'
import { afterEach, describe, expect, it, vi } from 'vitest'
import { useAssignmentsStore } from '../../src/stores/assignments'

const ASSIGNMENT = '33333333-3333-4333-8333-333333333333'
const comment = (id: string, createdAt: string, body: string) => ({
  id,
  assignmentId: ASSIGNMENT,
  author: { id: 't', name: 'Marta Ilves', role: 'teacher' },
  body,
  createdAt,
})
const json = (body: unknown, status = 200) =>
  new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } })

afterEach(() => vi.unstubAllGlobals())

describe('comment threads', () => {
  it('when a comment is posted before the thread has loaded, then it stays after the load', async () => {
    setActivePinia(createPinia())
    const older = comment('c1', '2026-03-01T10:00:00.000Z', 'Earlier note')
    const posted = comment('c2', '2026-03-02T10:00:00.000Z', 'Lovely start')
    let answerLoad: (response: Response) => void = () => undefined
    vi.stubGlobal(
      'fetch',
      vi.fn(async (_url: string, init?: RequestInit) =>
        init?.method === 'POST'
          ? json({ comment: posted }, 201)
          : new Promise<Response>((resolve) => (answerLoad = resolve)),
      ),
    )
    const store = useAssignmentsStore()
    const loading = store.loadThread(ASSIGNMENT)
    await store.addComment(ASSIGNMENT, 'Lovely start')
    answerLoad(json({ comments: [older] })) // read before the post, answered after it
    await loading
    expect(store.threads[ASSIGNMENT]?.map((c) => c.body)).toEqual(['Earlier note', 'Lovely start'])
  })
})
