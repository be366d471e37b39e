// Chord Tones grading, note by note: the exact pitch of the asked chord tone; a wrong pick is named
// as the chord spells it when it is another chord tone, else as the key (or the instrument) spells it.
import {
  describeMiss,
  gradeLocate,
  revealLocate,
  type Neck,
  type PickedCell,
} from '../engine/locate'
import type { DrillGrader, Grade } from '../engine/types'
import { nameInContext, spellPitch, toUnicode } from '../../theory'
import type { ChordsQuestion } from './chords-generator'

/** A chord degree with music glyphs: "b3" → "♭3", "#5" → "♯5". */
export const degreeLabel = (degree: string) => degree.replace(/b/g, '♭').replace(/#/g, '♯')

/** "the ♭3 of Dm7" */
export const toneRole = (question: Pick<ChordsQuestion, 'degree' | 'chord'>, degree?: string) =>
  `the ${degreeLabel(degree ?? question.degree)} of ${toUnicode(question.chord)}`

/** The picked pitch named for this chord: a chord tone as the chord spells it, else in the key. */
export function pickedName(question: ChordsQuestion, pitch: number, neck: Neck): string {
  const tone = question.tones.find((candidate) => candidate.pitchClass === pitch % 12)
  if (tone) return `${toUnicode(spellPitch(pitch, tone.name))} (${toneRole(question, tone.degree)})`
  const key = question.keyRef ?? undefined
  const name = nameInContext(pitch, { key, prefer: neck.accidentals })
  return `${toUnicode(name)} (not in ${toUnicode(question.chord)})`
}

function gradeTone(neck: Neck, question: ChordsQuestion, pick: PickedCell): Grade {
  const located = gradeLocate({
    neck,
    expectedPitch: question.expectedPitch,
    expectedName: question.name,
    pick,
  })
  const name = toUnicode(question.name)
  const feedback = located.correct
    ? `Right: ${name}, ${toneRole(question)}.`
    : `That is ${pickedName(question, pick.pitch, neck)}; ${toneRole(question)} is ${name}, ${describeMiss(pick.pitch, question.expectedPitch)}. It lives at the marked places.`
  return { ...located, feedback }
}

export function chordsGrader(neck: Neck): DrillGrader<ChordsQuestion, PickedCell> {
  return {
    grade: (question, pick) => gradeTone(neck, question, pick),
    reveal: (question) => {
      const revealed = revealLocate(neck, question.expectedPitch, question.name)
      const feedback = `${toneRole(question)} is ${toUnicode(question.name)}: it lives at the marked places.`
      return { ...revealed, feedback: feedback.charAt(0).toUpperCase() + feedback.slice(1) }
    },
  }
}
