// Range Runs: a scale from the lowest to the highest note a hand position offers and back down,
// through each fingering in turn.
import { mdiStairs } from '@mdi/js'
import { runsContract, RunsSettingsSchema } from '../../contract/drills'
import { HAND_SYSTEM_OPTIONS } from './hand-systems'
import { MAX_SHIFTS } from '../../theory'
import { defineDrill } from '../drill-definition'
import { fretField, LENGTH_FIELDS, switchField } from '../setting-fields'

export const runsDrill = defineDrill(runsContract, {
  route: '/practice/runs',
  purpose:
    'Play a scale from the lowest to the highest note a hand position offers, through every string combination.',
  icon: mdiStairs,
  accent: { light: '#6E4A8A', dark: '#C7A6DE', point: 'rectRot' },
  sound: true,
  defaults: (neck) =>
    RunsSettingsSchema.parse({
      tonic: 'C',
      scale: 'major',
      lowFret: Math.min(2, neck.frets),
      highFret: Math.min(5, neck.frets),
    }),
  presetFields: [
    { path: 'tonic', label: 'Key', kind: 'tonic' },
    { path: 'scale', label: 'Scale', kind: 'scale' },
    fretField('lowFret', 'From fret'),
    fretField('highFret', 'To fret'),
    {
      path: 'maxPerString',
      label: 'Most notes per string',
      kind: 'number',
      min: 1,
      max: 8,
      advanced: true,
    },
    { path: 'shifts', label: 'Hand shifts allowed', kind: 'number', min: 0, max: MAX_SHIFTS },
    { path: 'handSystem', label: 'Hand system', kind: 'select', options: HAND_SYSTEM_OPTIONS },
    switchField('showFingering', 'Show the fingering while playing', true),
    ...LENGTH_FIELDS,
  ],
  page: () => import('./RangeRunsView.vue'),
})
