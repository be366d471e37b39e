// Neck Recall: name every cell of a blank region from memory, typed on the board or picked.
import { mdiBrain } from '@mdi/js'
import { recallContract, RecallSettingsSchema } from '../../contract/drills'
import { defineDrill } from '../drill-definition'
import { FOCUS_FIELD, fretField, LENGTH_FIELDS, switchField } from '../setting-fields'
import { STRING_REFS, stringRefLabel } from '../../contract/string-span'

const STRING_OPTIONS = STRING_REFS.map((ref) => ({ title: stringRefLabel(ref), value: ref }))

export const recallDrill = defineDrill(recallContract, {
  route: '/practice/recall',
  purpose:
    'Name every note of a blank stretch of neck from memory, so you stop counting up from the open string.',
  icon: mdiBrain,
  accent: { light: '#A85A24', dark: '#E8A36B', point: 'triangle' },
  sound: false,
  defaults: (neck) =>
    RecallSettingsSchema.parse({
      region: {
        lowString: 0,
        highString: neck.tuning.length - 1,
        lowFret: 0,
        highFret: Math.min(5, neck.frets),
      },
    }),
  presetFields: [
    // strings counted from the instrument's ends, so the item fits every student's instrument
    { path: 'strings.from', label: 'From the', kind: 'select', options: STRING_OPTIONS },
    { path: 'strings.to', label: 'To the', kind: 'select', options: STRING_OPTIONS },
    fretField('region.lowFret', 'From fret'),
    fretField('region.highFret', 'To fret'),
    {
      path: 'order',
      label: 'Order',
      kind: 'select',
      options: [
        { title: 'Random', value: 'random' },
        { title: 'String by string', value: 'sequential' },
      ],
      advanced: true,
    },
    {
      path: 'answerMode',
      label: 'Answer by',
      kind: 'select',
      options: [
        { title: 'Typing the name', value: 'typed' },
        { title: 'Picking the name', value: 'picked' },
      ],
      advanced: true,
    },
    switchField('spellInKey', 'Only the spelling of the key counts', true),
    { path: 'keyTonic', label: 'Key', kind: 'tonic', advanced: true },
    { path: 'keyScale', label: 'Key scale', kind: 'scale', advanced: true },
    FOCUS_FIELD,
    ...LENGTH_FIELDS,
  ],
  page: () => import('./NeckRecallView.vue'),
})
