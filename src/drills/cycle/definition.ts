// Window Cycle: every key of a cycle, root to octave, inside a low/high window; notes that leave it
// fold back; then widen the window.
import { mdiRotateRight } from '@mdi/js'
import { cycleContract, CycleSettingsSchema } from '../../contract/drills'
import { instrumentRange } from '../../theory'
import { defineDrill } from '../drill-definition'
import { LENGTH_FIELDS, switchField } from '../setting-fields'
import { defaultWindow } from './cycle-generator'
import { DIRECTION_OPTIONS } from './directions'

export const cycleDrill = defineDrill(cycleContract, {
  route: '/practice/cycle',
  purpose:
    'Play every key of a cycle inside a fixed low/high window, folding notes back when they leave it.',
  icon: mdiRotateRight,
  accent: { light: '#4F5B69', dark: '#B9C2CE', point: 'crossRot' },
  sound: true,
  // No question count: the whole cycle, a known length.
  defaults: (neck) => CycleSettingsSchema.parse({ ...defaultWindow(neck), questionCount: null }),
  fits: (settings, neck) => {
    const { low, high } = instrumentRange(neck.tuning, neck.frets)
    return settings.low >= low && settings.high <= high
  },
  presetFields: [
    { path: 'low', label: 'Window low note', kind: 'pitch' },
    { path: 'high', label: 'Window high note', kind: 'pitch' },
    { path: 'scale', label: 'Scale', kind: 'scale' },
    {
      path: 'cycle',
      label: 'Key order',
      kind: 'select',
      options: [
        { title: 'Cycle of fourths', value: 'fourths' },
        { title: 'Cycle of fifths', value: 'fifths' },
        { title: 'Chromatic', value: 'chromatic' },
        { title: 'Whole steps', value: 'whole-tone' },
        { title: 'My own list', value: 'custom' },
      ],
    },
    {
      path: 'direction',
      label: 'Direction',
      kind: 'select',
      options: DIRECTION_OPTIONS,
    },
    {
      path: 'startTonic',
      label: 'Start key',
      kind: 'tonic',
      nullable: true,
      emptyText: 'first key of the cycle',
    },
    {
      path: 'customTonics',
      label: 'Keys, in order',
      kind: 'tonics',
      when: { path: 'cycle', equals: 'custom' },
    },
    {
      path: 'tempo',
      label: 'Click tempo (BPM)',
      kind: 'number',
      min: 30,
      max: 240,
      advanced: true,
    },
    switchField('click', 'Metronome click', true),
    ...LENGTH_FIELDS,
  ],
  page: () => import('./WindowCycleView.vue'),
})
