// The hand systems a run may be fingered with, as the setup form and the plan editor offer them.
import type { HandSystem } from '../../theory'

export const HAND_SYSTEM_OPTIONS: { title: string; value: HandSystem }[] = [
  { title: 'One finger per fret (4 frets)', value: 'one-finger-per-fret' },
  { title: 'Fingers 1-2-4 over 3 frets (low register)', value: 'three-fret' },
]

/** The shift choices: 0–3, each widening the hand position by a fret on either side. */
export const SHIFT_OPTIONS = [0, 1, 2, 3].map((value) => ({
  title: value === 0 ? 'Stay in position' : `Up to ${value} shift${value === 1 ? '' : 's'}`,
  value,
}))
