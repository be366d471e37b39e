// Octave Scatter: a root-to-root scale whose notes land in random octaves; find each exact pitch.
import { mdiScatterPlotOutline } from '@mdi/js'
import { scatterContract, ScatterSettingsSchema } from '../../contract/drills'
import { defineDrill } from '../drill-definition'
import { LENGTH_FIELDS } from '../setting-fields'

export const scatterDrill = defineDrill(scatterContract, {
  route: '/practice/scatter',
  purpose:
    'Play a scale whose notes jump octaves, so every note is known all over the neck, not in one box.',
  icon: mdiScatterPlotOutline,
  accent: { light: '#6A6A1C', dark: '#CFCF72', point: 'star' },
  sound: true,
  defaults: () => ScatterSettingsSchema.parse({ tonic: 'C', scale: 'major' }),
  presetFields: [
    { path: 'tonic', label: 'Key', kind: 'tonic' },
    { path: 'scale', label: 'Scale', kind: 'scale' },
    {
      path: 'low',
      label: 'Lowest note (empty: whole range)',
      kind: 'pitch',
      nullable: true,
      advanced: true,
    },
    {
      path: 'high',
      label: 'Highest note (empty: whole range)',
      kind: 'pitch',
      nullable: true,
      advanced: true,
    },
    {
      path: 'minDisplaced',
      label: 'At least this many notes displaced',
      kind: 'number',
      min: 0,
      max: 12,
      advanced: true,
    },
    {
      path: 'maxLeap',
      label: 'Largest leap (semitones)',
      kind: 'number',
      min: 1,
      max: 48,
      advanced: true,
    },
    {
      path: 'placement',
      label: 'Octaves',
      kind: 'select',
      options: [
        { title: 'Any octave', value: 'any' },
        { title: 'Every note in a different octave from the one before', value: 'each-moved' },
      ],
    },
    ...LENGTH_FIELDS,
  ],
  page: () => import('./OctaveScatterView.vue'),
})
