// The starter library: ready-made plans a teacher copies and adapts. Settings are parsed through the
// shared drill schemas at load time, so every default is filled in and a bad entry fails loudly.
// Both sides read it: the API serves it to teachers and the demo seed assigns two of its plans.
import { DrillPresetSchema } from './drills'
import type { StarterPlan } from './plans'
import { PracticeTargetSchema } from './targets'

interface StarterInput {
  key: string
  title: string
  notes: string
  items: { preset: unknown; target: unknown }[]
}

/** A Neck Recall item on the four lowest strings of any instrument, between two frets. */
const recallOnLowestFour = (lowFret: number, highFret: number, target: unknown) => ({
  preset: {
    drill: 'recall',
    settings: {
      region: { lowString: 0, highString: 3, lowFret, highFret },
      strings: { from: 'lowest', to: '4th-lowest' },
    },
  },
  target,
})

// Strings are counted from the lowest, so each item fits every 4- to 8-string instrument; frets stay
// within the first 12.
const STARTERS: StarterInput[] = [
  {
    key: 'first-position-names',
    title: 'First position note names',
    notes:
      'Name every note from the nut to the fifth fret on the four lowest strings, from memory. Short daily sessions beat one long one.',
    items: [
      recallOnLowestFour(0, 5, {
        kind: 'accuracy',
        minAccuracy: 0.9,
        maxMedianMs: 2500,
        minAttempts: 60,
      }),
    ],
  },
  {
    key: 'fourths-one-octave',
    title: 'Fourths in a one-octave window',
    notes:
      'Every major key round the cycle of fourths, root to octave, inside A1–A2. Notes that leave the window fold back down.',
    items: [
      {
        preset: {
          drill: 'cycle',
          settings: { low: 33, high: 45, scale: 'major', cycle: 'fourths' },
        },
        target: { kind: 'all-keys' },
      },
    ],
  },
  {
    key: 'pitch-hunt-twelve',
    title: 'Find it by ear, frets 0–12',
    notes:
      'Hear a pitch, find it in the right octave. Keep the volume moderate and take a short break every 20 minutes.',
    items: [
      {
        preset: { drill: 'hunt', settings: { lowFret: 0, highFret: 12 } },
        target: { kind: 'accuracy', minAccuracy: 0.85, maxMedianMs: 4000, minAttempts: 40 },
      },
    ],
  },
  {
    key: 'fifth-position-runs',
    title: 'C major through fifth position',
    notes:
      'From the lowest to the highest C-major note frets 5–8 offer, and back, through every string combination.',
    items: [
      {
        preset: {
          drill: 'runs',
          settings: { tonic: 'C', scale: 'major', lowFret: 5, highFret: 8 },
        },
        target: { kind: 'sessions', count: 3 },
      },
    ],
  },
  {
    key: 'weekly-neck-workout',
    title: 'Weekly neck workout',
    notes:
      'A mixed week: the middle of the neck from memory, then E minor pentatonic scattered across octaves.',
    items: [
      recallOnLowestFour(5, 9, {
        kind: 'accuracy',
        minAccuracy: 0.9,
        maxMedianMs: 3000,
        minAttempts: 50,
      }),
      {
        preset: { drill: 'scatter', settings: { tonic: 'E', scale: 'minor pentatonic' } },
        target: { kind: 'sessions', count: 4 },
      },
    ],
  },
]

function toStarter(input: StarterInput): StarterPlan {
  return {
    key: input.key,
    title: input.title,
    notes: input.notes,
    items: input.items.map((item) => ({
      preset: DrillPresetSchema.parse(item.preset),
      target: PracticeTargetSchema.parse(item.target),
    })),
  }
}

export const STARTER_PLANS: readonly StarterPlan[] = STARTERS.map(toStarter)
