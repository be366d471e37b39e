// FretboardBoard from the keyboard: roving focus, arrows, Home/End, Enter, typed answers.
import { mount } from '@vue/test-utils'
import { afterEach, describe, expect, it, vi } from 'vitest'
import { nextTick } from 'vue'
import FretboardBoard from '../../src/components/fretboard/FretboardBoard.vue'
import type { FretboardProps } from '../../src/components/fretboard/fretboard-types'
import { TYPING_BUFFER_MS } from '../../src/components/fretboard/useBoardKeyboard'
import { noteAt } from '../../src/theory'

const BASS_4 = [28, 33, 38, 43] // E1 A1 D2 G2 (MIDI 1.0 numbering)

function board(props: Partial<FretboardProps> = {}) {
  return mount(FretboardBoard, {
    props: { tuning: BASS_4, fretEnd: 12, ...props },
    attachTo: document.body,
  })
}
type Board = ReturnType<typeof board>
const cellEl = (wrapper: Board, string: number, fret: number) =>
  wrapper.find(`[data-string="${string}"][data-fret="${fret}"]`)
const focused = () => {
  const el = document.activeElement
  return el
    ? { string: Number(el.getAttribute('data-string')), fret: Number(el.getAttribute('data-fret')) }
    : null
}
async function press(wrapper: Board, key: string) {
  const el = document.activeElement as Element
  el.dispatchEvent(new KeyboardEvent('keydown', { key, bubbles: true, cancelable: true }))
  await nextTick()
  await nextTick()
}
async function focusCell(wrapper: Board, string: number, fret: number) {
  ;(cellEl(wrapper, string, fret).element as SVGGElement).focus()
  await nextTick()
}

afterEach(() => {
  document.body.innerHTML = ''
  vi.useRealTimers()
})

describe('roving tabindex', () => {
  it('makes exactly one cell reachable by Tab: the active cell when given', () => {
    const wrapper = board({ activeCell: { string: 2, fret: 3 } })
    const tabbable = wrapper.findAll('[tabindex="0"]')
    expect(tabbable).toHaveLength(1)
    expect(tabbable[0]!.attributes('aria-label')).toBe('D string, fret 3')
  })

  it('falls back to the first selectable cell', () => {
    const wrapper = board({ selectable: (cell) => cell.fret >= 5 })
    expect(wrapper.find('[tabindex="0"]').attributes('data-fret')).toBe('5')
  })
})

describe('arrow keys', () => {
  it('move up to higher strings and right toward the body, emitting update:activeCell and moving focus', async () => {
    const wrapper = board()
    await focusCell(wrapper, 1, 5)
    await press(wrapper, 'ArrowUp')
    expect(focused()).toEqual({ string: 2, fret: 5 })
    await press(wrapper, 'ArrowRight')
    expect(focused()).toEqual({ string: 2, fret: 6 })
    await press(wrapper, 'ArrowDown')
    await press(wrapper, 'ArrowDown')
    await press(wrapper, 'ArrowLeft')
    expect(focused()).toEqual({ string: 0, fret: 5 })
    expect(wrapper.emitted('update:activeCell')!.at(-1)).toEqual([{ string: 0, fret: 5 }])
    expect(wrapper.findAll('[tabindex="0"]')).toHaveLength(1)
  })

  it('stop at the edges of the board', async () => {
    const wrapper = board()
    await focusCell(wrapper, 3, 12)
    await press(wrapper, 'ArrowUp')
    await press(wrapper, 'ArrowRight')
    expect(focused()).toEqual({ string: 3, fret: 12 })
  })

  it('follow the screen on a left-handed board: ArrowRight goes toward the nut', async () => {
    const wrapper = board({ leftHanded: true })
    await focusCell(wrapper, 1, 5)
    await press(wrapper, 'ArrowRight')
    expect(focused()).toEqual({ string: 1, fret: 4 })
  })

  it('Home and End jump to the first and last fret of the span', async () => {
    const wrapper = board({ fretStart: 3, fretEnd: 9 })
    await focusCell(wrapper, 2, 5)
    await press(wrapper, 'Home')
    expect(focused()).toEqual({ string: 2, fret: 3 })
    await press(wrapper, 'End')
    expect(focused()).toEqual({ string: 2, fret: 9 })
  })
})

describe('Enter and Space', () => {
  it('select the active cell with its pitch from noteAt', async () => {
    const wrapper = board()
    await focusCell(wrapper, 1, 5)
    await press(wrapper, 'Enter')
    await press(wrapper, 'ArrowUp')
    await press(wrapper, ' ')
    expect(wrapper.emitted('select')).toEqual([
      [{ string: 1, fret: 5, pitch: noteAt(BASS_4, 1, 5) }],
      [{ string: 2, fret: 5, pitch: noteAt(BASS_4, 2, 5) }],
    ])
  })
})

describe('typed answers', () => {
  it('a letter then b answers a flat at once', async () => {
    const wrapper = board({ typingAnswers: true })
    await focusCell(wrapper, 0, 11)
    await press(wrapper, 'e')
    expect(wrapper.text()).toContain('Typed: E')
    await press(wrapper, 'b')
    expect(wrapper.emitted('answer')).toEqual([['Eb', { string: 0, fret: 11 }, expect.any(Number)]])
  })

  it('a letter then # answers a sharp; a letter alone is sent after the short wait', async () => {
    vi.useFakeTimers()
    const wrapper = board({ typingAnswers: true })
    await focusCell(wrapper, 1, 1)
    await press(wrapper, 'A')
    await press(wrapper, '#')
    await press(wrapper, 'ArrowRight')
    await press(wrapper, 'b')
    expect(wrapper.emitted('answer')).toHaveLength(1)
    vi.advanceTimersByTime(TYPING_BUFFER_MS + 10)
    expect(wrapper.emitted('answer')).toEqual([
      ['A#', { string: 1, fret: 1 }, expect.any(Number)],
      ['B', { string: 1, fret: 2 }, expect.any(Number)],
    ])
  })

  it('Enter sends the typed letter at once instead of selecting', async () => {
    const wrapper = board({ typingAnswers: true })
    await focusCell(wrapper, 2, 0)
    await press(wrapper, 'd')
    await press(wrapper, 'Enter')
    expect(wrapper.emitted('answer')).toEqual([['D', { string: 2, fret: 0 }, expect.any(Number)]])
    expect(wrapper.emitted('select')).toBeUndefined()
  })

  it('the answer carries the time of its first key, so the wait for a ♯/♭ is not counted', async () => {
    vi.useFakeTimers({ toFake: ['setTimeout', 'clearTimeout', 'performance'] })
    const wrapper = board({ typingAnswers: true })
    await focusCell(wrapper, 3, 2)
    const pressedAt = performance.now()
    await press(wrapper, 'a')
    vi.advanceTimersByTime(TYPING_BUFFER_MS + 10)
    const [[text, , typedAt]] = wrapper.emitted('answer') as [[string, unknown, number]]
    expect(text).toBe('A')
    expect(performance.now() - pressedAt).toBeGreaterThanOrEqual(TYPING_BUFFER_MS)
    expect(typedAt - pressedAt).toBeLessThan(50)
    vi.useRealTimers()
  })

  it('letters do nothing when typing answers is off', async () => {
    const wrapper = board()
    await focusCell(wrapper, 2, 0)
    await press(wrapper, 'd')
    await press(wrapper, 'Enter')
    expect(wrapper.emitted('answer')).toBeUndefined()
    expect(wrapper.emitted('select')).toHaveLength(1)
  })
})
