import { describe, expect, it } from 'vitest'
import { ChordsSettingsSchema } from '../../contract/drills'
import { acceptedNames } from '../../theory'
import { chordsGrader, degreeLabel, pickedName } from './chords-grader'
import { chordsSession } from './chords-generator'

const NECK = { tuning: [28, 33, 38, 43], frets: 20, accidentals: 'flat' as const } // E1 A1 D2 G2
const settings = ChordsSettingsSchema.parse({ lowFret: 2, highFret: 6 })
// Dm7 in frets 2–6 (see the generator test): D2 F2 A2 C3; the second note is F2, the b3
const [, third] = chordsSession(settings, NECK.tuning).questions
const F2 = { string: 2, fret: 3, pitch: 41 } // D2 + 3 (arithmetic)

describe('Chord Tones grader (one note at a time)', () => {
  const grader = chordsGrader(NECK)

  it('the exact pitch on any string is right, named with its degree', () => {
    const grade = grader.grade(third!, F2, [])
    expect(grade.correct).toBe(true)
    expect(grade.feedback).toBe('Right: F2, the ♭3 of Dm7.')
    expect(grade.cell).toEqual({ string: 2, fret: 3 })
    expect(grader.grade(third!, { string: 1, fret: 8, pitch: 41 }, []).correct).toBe(true)
  })

  it('the right note an octave off is a miss', () => {
    const grade = grader.grade(third!, { string: 3, fret: 10, pitch: 53 }, [])
    expect(grade.correct).toBe(false)
    expect(grade.feedback).toContain('the ♭3 of Dm7 is F2, an octave lower')
  })

  it('another chord tone is named as the chord spells it, with its degree', () => {
    const grade = grader.grade(third!, { string: 3, fret: 2, pitch: 45 }, [])
    expect(grade.correct).toBe(false)
    expect(grade.feedback).toBe(
      'That is A2 (the 5 of Dm7); the ♭3 of Dm7 is F2, 4 semitones lower. It lives at the marked places.',
    )
  })

  it('a note outside the chord is named as the key allows (one accidental, common practice)', () => {
    const name = pickedName(third!, 42, NECK) // F#2 / Gb2, outside C major
    expect(name).toMatch(/^(F♯2|G♭2) \(not in Dm7\)$/)
    expect(acceptedNames(42, { tonic: 'C', scale: 'major' })).toContain(
      name.slice(0, 2).replace('♯', '#').replace('♭', 'b'),
    )
  })

  it('"show me" is a miss marked revealed that names the tone', () => {
    const grade = grader.reveal(third!, [])
    expect(grade.correct).toBe(false)
    expect(grade.detail).toEqual({ revealed: true })
    expect(grade.feedback).toBe('The ♭3 of Dm7 is F2: it lives at the marked places.')
  })

  it('degree labels use music glyphs', () => {
    expect(['1', 'b3', '#5', 'bb7'].map(degreeLabel)).toEqual(['1', '♭3', '♯5', '♭♭7'])
  })
})
