// src/api/http.ts, the app's only fetch, sends the anti-CSRF header the server requires on every
// state-changing request: JSON bodies, bodyless POSTs and multipart uploads alike.
import { afterEach, expect, it, vi } from 'vitest'
import { http } from '../../src/api/http'
import { uploadRecording } from '../../src/api/assignments'

afterEach(() => vi.unstubAllGlobals())

function recordRequests() {
  const seen: { method: string; url: string; headers: Headers; body: unknown }[] = []
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string, init: RequestInit = {}) => {
      seen.push({
        method: init.method ?? 'GET',
        url,
        headers: new Headers(init.headers),
        body: init.body,
      })
      return new Response(null, { status: 204 })
    }),
  )
  return seen
}

it('when the client posts JSON, posts nothing, puts, patches, deletes or uploads a form, then each request carries X-Requested-With: ambitus', async () => {
  const seen = recordRequests()
  await http.post('/plans', { title: 'x' })
  await http.post('/plans/p1/copy')
  await http.put('/plans/p1', {})
  await http.patch('/admin/users/u1', { role: 'teacher' })
  await http.delete('/assignments/a1/recordings/r1')
  await uploadRecording('a1', 'item-1', {
    audio: new Blob(['RIFF']),
    fileName: 'take.wav',
    title: '',
  })
  expect(seen.map((r) => r.method)).toEqual(['POST', 'POST', 'PUT', 'PATCH', 'DELETE', 'POST'])
  for (const request of seen) expect(request.headers.get('X-Requested-With')).toBe('ambitus')
  // The browser sets the multipart boundary itself: no content-type of ours on the upload.
  expect(seen[5]!.body).toBeInstanceOf(FormData)
  expect(seen[5]!.headers.get('content-type')).toBeNull()
})
