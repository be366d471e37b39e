// Issue 16 item 6 in the page: a take's waveform (the real wavesurfer.js; jsdom only lacks a 2D
// canvas and audio decoding, stood in for below) with the comments pinned to its moments — listed
// in order, drawn as markers, a click seeks there; a comment is pinned at the play head.
import { flushPromises } from '@vue/test-utils'
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import TakeReview from '../../src/components/recordings/TakeReview.vue'
import { useRecordingsStore } from '../../src/stores/recordings'
import { mountWithApp } from '../helpers/mount'

const COMMENTS = [
  {
    id: 'c1',
    recordingId: 'r1',
    atMs: 250,
    body: 'Open E rings on',
    author: { id: 'u-student', name: 'Wren', role: 'student' },
    createdAt: '2026-12-03T10:00:00Z',
  },
  {
    id: 'c2',
    recordingId: 'r1',
    atMs: 1500,
    body: 'The slide lands late',
    author: { id: 'u-teacher', name: 'Marta', role: 'teacher' },
    createdAt: '2026-12-03T10:01:00Z',
  },
]
const RIGHTS = { canRetitle: true, canDelete: false, canComment: true }

type Answer = { status?: number; body: unknown }
const json = ({ status = 200, body }: Answer) =>
  new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } })

/** fetch for the API (JSON answers per "METHOD /path") and for the take's audio bytes. */
function stubServer(answers: Record<string, Answer>) {
  const sent: { method: string; path: string; body: unknown }[] = []
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      const url = new URL(String(input), 'http://localhost')
      const method = init?.method ?? 'GET'
      const body = typeof init?.body === 'string' ? JSON.parse(init.body) : undefined
      sent.push({ method, path: url.pathname, body })
      if (url.pathname.endsWith('/audio')) return new Response(new Uint8Array(64))
      const answer = answers[`${method} ${url.pathname}`]
      return answer ? json(answer) : json({ status: 404, body: { error: { message: 'none' } } })
    }),
  )
  return sent
}

/** What jsdom lacks: a 2D canvas context (every drawing call a no-op) and audio decoding. */
function standInCanvasAndDecoder() {
  const context = new Proxy({} as Record<string | symbol, unknown>, {
    get: (target, key) =>
      key in target
        ? target[key]
        : key === 'measureText'
          ? () => ({ width: 0 })
          : key === 'createLinearGradient'
            ? () => ({ addColorStop() {} })
            : () => undefined,
    set: (target, key, value) => ((target[key] = value), true),
  })
  vi.spyOn(HTMLCanvasElement.prototype, 'getContext').mockReturnValue(
    context as unknown as CanvasRenderingContext2D,
  )
  class DecodingContext {
    state = 'running'
    async decodeAudioData() {
      const samples = Float32Array.from({ length: 16000 }, (_, i) => Math.sin(i / 10))
      return {
        duration: 2,
        length: 16000,
        sampleRate: 8000,
        numberOfChannels: 1,
        getChannelData: () => samples,
      }
    }
    async close() {
      this.state = 'closed'
    }
  }
  vi.stubGlobal('AudioContext', DecodingContext)
}

let seekedTo: number[]
beforeEach(() => {
  standInCanvasAndDecoder()
  seekedTo = []
  // Where the play head of the take's media element is put; jsdom loads no media, so it reports
  // the media as ready to play.
  vi.spyOn(HTMLMediaElement.prototype, 'readyState', 'get').mockReturnValue(4)
  vi.spyOn(HTMLMediaElement.prototype, 'currentTime', 'set').mockImplementation((t: number) =>
    seekedTo.push(t),
  )
})
afterEach(() => {
  vi.restoreAllMocks()
  vi.unstubAllGlobals()
  document.body.innerHTML = ''
})

async function mountReview(answers: Record<string, Answer>) {
  const sent = stubServer({
    'GET /api/recordings/r1/comments': { body: { comments: COMMENTS, rights: RIGHTS } },
    ...answers,
  })
  const { wrapper, pinia } = mountWithApp(TakeReview, {
    props: { recordingId: 'r1', durationMs: 2000, label: 'Walking line' },
    attachTo: document.body,
  })
  await vi.waitFor(() =>
    expect(wrapper.find('[data-testid="take-play"]').attributes('disabled')).toBeUndefined(),
  )
  await flushPromises()
  return { wrapper, sent, recordings: useRecordingsStore(pinia) }
}

describe('TakeReview', () => {
  it('when the take opens, then its pinned comments are listed by moment and drawn as markers along the waveform', async () => {
    const { wrapper } = await mountReview({})
    const moments = wrapper.findAll('[data-testid="pinned-comments"] .moment').map((m) => m.text())
    expect(moments).toEqual(['0:00.2', '0:01.5'])
    const markers = wrapper.findAll('[data-testid="pin-marker"]')
    // 250 ms and 1,500 ms of a 2,000 ms take
    expect(markers.map((m) => (m.element as HTMLElement).style.left)).toEqual(['12.5%', '75%'])
    expect(wrapper.find('[data-testid="take-clock"]').text()).toBe('0:00.0 / 0:02')
  })

  it('when a pinned comment is clicked, then the player seeks to its moment and a new comment would be pinned there', async () => {
    const { wrapper } = await mountReview({})
    await wrapper.find('[data-testid="pinned-c2"]').trigger('click')
    await flushPromises()
    expect(seekedTo.at(-1)).toBe(1.5)
    expect(wrapper.find('[data-testid="take-clock"]').text()).toBe('0:01.5 / 0:02')
    expect(wrapper.find('form button[type="submit"]').text()).toBe('Pin at 0:01.5')
    await wrapper.findAll('[data-testid="pin-marker"]')[0]!.trigger('click')
    expect(seekedTo.at(-1)).toBe(0.25)
  })

  it('when the waveform itself is clicked, then the player seeks to that point of the take', async () => {
    const { wrapper } = await mountReview({})
    const host = wrapper.find('.wave').element.firstElementChild as HTMLElement
    const waveArea = host.shadowRoot!.querySelector('.wrapper') as HTMLElement
    vi.spyOn(waveArea, 'getBoundingClientRect').mockReturnValue({
      ...{ left: 0, top: 0, width: 400, height: 72, right: 400, bottom: 72, x: 0, y: 0 },
      toJSON: () => ({}),
    })
    waveArea.dispatchEvent(new MouseEvent('click', { clientX: 100, clientY: 10, bubbles: true }))
    await flushPromises()
    expect(seekedTo.at(-1)).toBeCloseTo(0.5, 5) // a quarter of the way into a 2 s take
    await vi.waitFor(() =>
      expect(wrapper.find('form button[type="submit"]').text()).toBe('Pin at 0:00.5'),
    )
  })

  it('when the waveform has the focus, then arrow keys step the play head a second, Home and End jump', async () => {
    const { wrapper } = await mountReview({})
    const slider = wrapper.find('[role="slider"]')
    expect(slider.attributes('aria-valuemax')).toBe('2')
    await slider.trigger('keydown', { key: 'ArrowRight' })
    expect(seekedTo.at(-1)).toBe(1)
    expect(slider.attributes('aria-valuetext')).toBe('0:01.0')
    await slider.trigger('keydown', { key: 'End' })
    expect(seekedTo.at(-1)).toBe(2)
    await slider.trigger('keydown', { key: 'ArrowRight' }) // stays at the end
    expect(seekedTo.at(-1)).toBe(2)
    await slider.trigger('keydown', { key: 'Home' })
    expect(seekedTo.at(-1)).toBe(0)
  })

  it('when a comment is pinned at the play head, then it is sent with that moment and joins the list in order', async () => {
    const created = {
      ...COMMENTS[0]!,
      id: 'c3',
      atMs: 1000,
      body: 'Breathe here',
      author: { id: 'u-teacher', name: 'Marta', role: 'teacher' },
    }
    const { wrapper, sent } = await mountReview({
      'POST /api/recordings/r1/comments': { status: 201, body: { comment: created } },
    })
    const waveform = wrapper.findComponent({ name: 'TakeWaveform' })
    ;(waveform.vm as unknown as { seek: (ms: number) => void }).seek(1000)
    await flushPromises()
    await wrapper.find('[data-testid="pin-body"] textarea').setValue('Breathe here')
    await wrapper.find('form').trigger('submit')
    await flushPromises()
    expect(sent.filter((r) => r.method === 'POST').map((r) => r.body)).toEqual([
      { atMs: 1000, body: 'Breathe here' },
    ])
    const moments = wrapper.findAll('[data-testid="pinned-comments"] .moment').map((m) => m.text())
    expect(moments).toEqual(['0:00.2', '0:01.0', '0:01.5'])
  })

  it('when the server refuses the moment, then its words show once, beside the form, and nothing is added', async () => {
    const { wrapper, recordings } = await mountReview({
      'POST /api/recordings/r1/comments': {
        status: 400,
        body: {
          error: {
            code: 'validation',
            message: 'Some fields need attention.',
            fields: { atMs: ['The take lasts 0:02; pin the comment inside it.'] },
          },
        },
      },
    })
    await wrapper.find('[data-testid="pin-body"] textarea').setValue('Too late')
    await wrapper.find('form').trigger('submit')
    await flushPromises()
    expect(wrapper.text()).toContain('The take lasts 0:02; pin the comment inside it.')
    expect(wrapper.findAll('[data-testid="pin-marker"]')).toHaveLength(2)
    expect(recordings.error).toBeNull() // the Recordings page would show the store's error again
  })

  it('when the user may only listen (a plan’s reference, as a student), then there is no comment form', async () => {
    const { wrapper } = await mountReview({
      'GET /api/recordings/r1/comments': {
        body: { comments: COMMENTS, rights: { ...RIGHTS, canComment: false } },
      },
    })
    expect(wrapper.find('form').exists()).toBe(false)
    expect(wrapper.findAll('[data-testid="pin-marker"]')).toHaveLength(2)
  })
})
