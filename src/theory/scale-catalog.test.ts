import { describe, expect, it } from 'vitest'
import { ScaleType } from 'tonal'
import { readableScaleName, SCALE_TYPES, scaleCatalog, signatureFamilyOf } from './scale-catalog'
import { CURATED_SCALES } from './scale-catalog-data'
import { COMMON_SCALES } from './scale-data'

describe('the scale list (issue 13)', () => {
  it('lists every tonal scale type once, curated ones first (tonal ScaleType.all, library)', () => {
    const names = ScaleType.all().map((type) => type.name)
    expect(SCALE_TYPES.map((type) => type.name).sort()).toEqual([...names].sort())
    expect(SCALE_TYPES.slice(0, COMMON_SCALES.length).map((type) => type.name)).toEqual(
      COMMON_SCALES,
    )
    for (const type of SCALE_TYPES) {
      expect(type.noteCount).toBe(ScaleType.get(type.name).intervals.length)
      expect(type.common).toBe(type.group !== 'more')
    }
  })

  it('curates what the trade practises, under the trade’s names (theory texts; common practice)', () => {
    const label = (name: string) => CURATED_SCALES.find((scale) => scale.name === name)?.label
    for (const mode of ['Dorian', 'Phrygian', 'Lydian', 'Mixolydian', 'Locrian']) {
      expect(label(mode.toLowerCase())).toBe(mode)
    }
    expect(label('major')).toContain('Ionian')
    expect(label('minor')).toContain('Aeolian')
    for (const name of [
      'harmonic minor',
      'melodic minor',
      'major pentatonic',
      'minor pentatonic',
    ]) {
      expect(label(name)).toBeDefined()
    }
    for (const name of [
      'minor blues',
      'major blues',
      'whole tone',
      'chromatic',
      'phrygian dominant',
    ]) {
      expect(label(name)).toBeDefined()
    }
    expect(label('diminished')).toMatch(/whole-half/)
    expect(label('half-whole diminished')).toMatch(/half-whole/)
    for (const scale of CURATED_SCALES) expect(ScaleType.get(scale.name).empty).toBe(false) // tonal
  })

  it('groups the list and keeps raw data names out of it', () => {
    const groups = scaleCatalog()
    expect(groups.map((group) => group.label)).toEqual([
      'Major and its modes',
      'Minor scales',
      'Pentatonic and blues',
      'Symmetric and chromatic',
      'Jazz and colour scales',
      'More scales',
    ])
    expect(groups.flatMap((group) => group.scales)).toHaveLength(SCALE_TYPES.length)
    for (const type of SCALE_TYPES) {
      expect(type.label).not.toMatch(/#\d|mystery|messiaen's/) // readable everywhere
      expect(type.label.charAt(0)).toBe(type.label.charAt(0).toUpperCase())
    }
  })

  it.each([
    ['mystery #1', 'Mystery scale no. 1'],
    ["messiaen's mode #5", 'Messiaen mode 5'],
    ['dorian b2', 'Dorian ♭2'],
    ['lydian #9', 'Lydian ♯9'],
    ['kumoijoshi', 'Kumoijoshi'],
  ])('readableScaleName(%j) = %j', (name, label) => {
    expect(readableScaleName(name)).toBe(label)
  })

  it.each([
    ['dorian', 'mode'],
    ['melodic minor', 'minor'],
    ['minor bebop', 'minor'], // tonal's own minor variants take the natural minor's signature
    ['lydian minor', 'own'], // a major-third scale despite its name
    ['flamenco', 'own'],
  ])('signatureFamilyOf(%j) = %j', (scale, family) => {
    expect(signatureFamilyOf(scale)).toBe(family)
  })
})
