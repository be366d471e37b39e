// Chord Tones: the chord tones of each chord of a progression (ii–V–I or 12-bar blues around a
// cycle, or an own list), as arpeggios in a hand position or inside a pitch window.
import { mdiLayersTripleOutline } from '@mdi/js'
import { chordsContract, ChordsSettingsSchema } from '../../contract/drills'
import { instrumentRange } from '../../theory'
import { defineDrill } from '../drill-definition'
import { fretField, LENGTH_FIELDS } from '../setting-fields'
import { defaultWindow } from '../cycle/cycle-generator'

const options = (pairs: [string, string][]) => pairs.map(([value, title]) => ({ title, value }))

export const PROGRESSION_OPTIONS = options([
  ['two-five-one', 'ii–V–I in every key'],
  ['blues', '12-bar blues in every key'],
  ['custom', 'My own chords'],
])
export const SIZE_OPTIONS = options([
  ['seventh', 'As written (sevenths)'],
  ['sixth', 'Sixth chords for major and minor'],
  ['triad', 'Triads'],
])
export const INVERSION_OPTIONS = options([
  ['root', 'Root position'],
  ['first', '1st inversion (3rd in the bass)'],
  ['second', '2nd inversion (5th in the bass)'],
  ['third', '3rd inversion (7th in the bass)'],
  ['rotate', 'Each chord the next inversion'],
])
export const AREA_OPTIONS = options([
  ['position', 'A hand position (frets)'],
  ['window', 'A pitch window (low to high note)'],
])

const whenArea = (area: string) => ({ when: { path: 'area', equals: area } })

export const chordsDrill = defineDrill(chordsContract, {
  route: '/practice/chords',
  purpose:
    'Find the chord tones of each chord of a progression as arpeggios, in a position or a window.',
  icon: mdiLayersTripleOutline,
  accent: { light: '#9A3B5A', dark: '#E79AB3', point: 'cross' },
  sound: true,
  // A five-fret position holds every pitch class on a bass or guitar tuned in fourths.
  defaults: (neck) =>
    ChordsSettingsSchema.parse({
      lowFret: Math.min(2, neck.frets),
      highFret: Math.min(6, neck.frets),
      ...defaultWindow(neck),
    }),
  fits: (settings, neck) => {
    const { low, high } = instrumentRange(neck.tuning, neck.frets)
    return settings.highFret <= neck.frets && settings.low >= low && settings.high <= high
  },
  presetFields: [
    { path: 'progression', label: 'Progression', kind: 'select', options: PROGRESSION_OPTIONS },
    {
      path: 'quality',
      label: 'Major or minor',
      kind: 'select',
      options: options([
        ['major', 'Major'],
        ['minor', 'Minor'],
      ]),
    },
    { path: 'startKey', label: 'Start key', kind: 'tonic' },
    {
      path: 'cycle',
      label: 'Key order',
      kind: 'select',
      options: options([
        ['fourths', 'Cycle of fourths'],
        ['fifths', 'Cycle of fifths'],
      ]),
    },
    {
      path: 'customChords',
      label: 'Chord symbols (e.g. Am7 | D7 | Gmaj7)',
      kind: 'text',
      when: { path: 'progression', equals: 'custom' },
    },
    { path: 'size', label: 'Chord size', kind: 'select', options: SIZE_OPTIONS },
    { path: 'inversion', label: 'Inversion', kind: 'select', options: INVERSION_OPTIONS },
    { path: 'area', label: 'Where', kind: 'select', options: AREA_OPTIONS },
    { ...fretField('lowFret', 'From fret'), ...whenArea('position') },
    { ...fretField('highFret', 'To fret'), ...whenArea('position') },
    { path: 'low', label: 'Window low note', kind: 'pitch', ...whenArea('window') },
    { path: 'high', label: 'Window high note', kind: 'pitch', ...whenArea('window') },
    ...LENGTH_FIELDS,
  ],
  page: () => import('./ChordTonesView.vue'),
})
