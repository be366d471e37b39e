// Pitch Hunt: hear a pitch (name optional) and find where it lives, in the right octave.
import { mdiEarHearing } from '@mdi/js'
import { huntContract, HuntSettingsSchema } from '../../contract/drills'
import { defineDrill } from '../drill-definition'
import { FOCUS_FIELD, fretField, LENGTH_FIELDS, switchField } from '../setting-fields'

export const huntDrill = defineDrill(huntContract, {
  route: '/practice/hunt',
  purpose: 'Hear a pitch and find where it lives in the right octave, linking sound to place.',
  icon: mdiEarHearing,
  accent: { light: '#2F7A6F', dark: '#7FC4B9', point: 'rect' },
  sound: true,
  defaults: () => HuntSettingsSchema.parse({}),
  presetFields: [
    fretField('lowFret', 'From fret'),
    fretField('highFret', 'To fret'),
    switchField('findAll', 'Find every place'),
    switchField('showName', 'Show the note name', true),
    FOCUS_FIELD,
    ...LENGTH_FIELDS,
  ],
  page: () => import('./PitchHuntView.vue'),
})
