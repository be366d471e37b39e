// The board on a narrow screen: string names at the nut, the asked cell flagged, scrolling that keeps
// the question in view, and the keyboard handed back to the board when focus fell to the page.
import { mount } from '@vue/test-utils'
import { nextTick } from 'vue'
import { afterEach, describe, expect, it } from 'vitest'
import FretboardBoard from '../../src/components/fretboard/FretboardBoard.vue'
import { revealOffset } from '../../src/components/fretboard/useKeepInView'

// Open strings as MIDI numbers (MIDI 1.0; scientific pitch notation, REFERENCES.md)
const BASS_4 = [28, 33, 38, 43] // E1 A1 D2 G2
const DROP_D_FLAT = [26, 32, 37, 42] // D1 Ab1 Db2 Gb2 (names only, spelled with flats)

afterEach(() => {
  document.body.innerHTML = ''
})

describe('string names and the asked cell', () => {
  it('names every string at the nut, lowest at the bottom', () => {
    const wrapper = mount(FretboardBoard, { props: { tuning: BASS_4 } })
    const names = [0, 1, 2, 3].map((s) => wrapper.find(`[data-string-name="${s}"]`))
    expect(names.map((n) => n.text())).toEqual(['E', 'A', 'D', 'G'])
    const y = names.map((n) => Number(n.attributes('y')))
    expect(y[0]).toBeGreaterThan(y[3]!)
  })

  it('spells the names with the instrument’s accidentals', () => {
    const wrapper = mount(FretboardBoard, {
      props: { tuning: DROP_D_FLAT, accidentals: 'flat' },
    })
    expect(wrapper.findAll('.fb-string-name').map((n) => n.text())).toEqual(['D', 'A♭', 'D♭', 'G♭'])
  })

  it('puts the names on the right for a left-handed board', () => {
    const right = mount(FretboardBoard, { props: { tuning: BASS_4 } })
    const left = mount(FretboardBoard, { props: { tuning: BASS_4, leftHanded: true } })
    const x = (w: typeof right) => Number(w.find('[data-string-name="0"]').attributes('x'))
    const width = Number(left.find('svg').attributes('viewBox')!.split(' ')[2])
    expect(x(right)).toBeLessThan(width / 2)
    expect(x(left)).toBeCloseTo(width - x(right), 6)
  })

  it('flags only the asked cell with data-asked="true"', () => {
    const wrapper = mount(FretboardBoard, {
      props: { tuning: BASS_4, asked: { string: 1, fret: 5 } },
    })
    const asked = wrapper.findAll('[data-asked="true"]')
    expect(asked).toHaveLength(1)
    expect(asked[0]!.attributes('data-string')).toBe('1')
    expect(asked[0]!.attributes('data-fret')).toBe('5')
  })
})

describe('revealOffset (a 350 px box over a wider neck)', () => {
  it('leaves the scroll alone when everything asked is already visible', () => {
    expect(revealOffset(100, 350, { left: 150, right: 300 }, null)).toBe(100)
  })

  it('centres marked places that fit together but are off-screen', () => {
    // marks 600–800 → centre 700 − 175
    expect(revealOffset(0, 350, { left: 600, right: 800 }, null)).toBe(525)
  })

  it('brings the asked cell in with a margin when all marks do not fit', () => {
    const to = revealOffset(0, 350, { left: 0, right: 1200 }, { left: 900, right: 950 })
    expect(to).toBe(950 - 350 + 12)
    expect(revealOffset(800, 350, { left: 0, right: 1200 }, { left: 100, right: 150 })).toBe(88)
  })

  it('shows the start of marks that do not fit when nothing is asked', () => {
    expect(revealOffset(0, 350, { left: 500, right: 1500 }, null)).toBe(488)
  })

  it('does nothing without marks or an asked cell', () => {
    expect(revealOffset(40, 350, null, null)).toBe(40)
  })
})

describe('holding the keyboard', () => {
  it('focuses the board when it mounts while focus is on the page', async () => {
    const wrapper = mount(FretboardBoard, {
      props: { tuning: BASS_4, holdFocus: true, activeCell: { string: 2, fret: 3 } },
      attachTo: document.body,
    })
    await nextTick()
    await nextTick()
    expect(document.activeElement?.getAttribute('data-string')).toBe('2')
    expect(document.activeElement?.getAttribute('data-fret')).toBe('3')
    wrapper.unmount()
  })

  it('takes focus back after an answer when the focused control went away', async () => {
    const button = document.createElement('button')
    document.body.append(button)
    const wrapper = mount(FretboardBoard, {
      props: { tuning: BASS_4, holdFocus: true },
      attachTo: document.body,
    })
    button.focus()
    await wrapper.setProps({ marks: [{ string: 0, fret: 1, kind: 'wrong' }] })
    await nextTick()
    expect(document.activeElement).toBe(button)
    button.remove()
    await wrapper.setProps({ marks: [{ string: 0, fret: 3, kind: 'hint' }] })
    await nextTick()
    expect(document.activeElement?.closest('[data-testid="fretboard"]')).not.toBeNull()
  })

  it('leaves focus alone when it does not hold it', async () => {
    mount(FretboardBoard, { props: { tuning: BASS_4 }, attachTo: document.body })
    await nextTick()
    await nextTick()
    expect(document.activeElement).toBe(document.body)
  })
})
