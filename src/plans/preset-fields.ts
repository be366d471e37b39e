// The plan editor's form for each drill: a starting preset (the shared zod defaults filled in) and
// the fields a teacher edits, main ones first and the rest under "More settings".
import {
  DRILL_IDS,
  DrillPresetSchema,
  type DrillId,
  type DrillPreset,
} from '../drills/drill-settings'

export type FieldKind = 'number' | 'switch' | 'select' | 'tonic' | 'scale' | 'pitch' | 'tonics'

export interface FieldSpec {
  /** Dotted path inside the settings ("region.lowFret"). */
  path: string
  label: string
  kind: FieldKind
  min?: number
  max?: number
  /** Shown to the teacher as value + offset (strings count from 1 in the form, from 0 in data). */
  offset?: number
  nullable?: boolean
  options?: { title: string; value: string }[]
  advanced?: boolean
  /** Only shown when another setting has a value (e.g. custom keys when the cycle is custom). */
  when?: { path: string; equals: unknown }
}

// Values for the settings that have no default in the shared schema.
const REQUIRED: Record<DrillId, object> = {
  recall: { region: { lowString: 0, highString: 3, lowFret: 0, highFret: 5 } },
  hunt: {},
  runs: { tonic: 'C', scale: 'major', lowFret: 5, highFret: 8 },
  scatter: { tonic: 'E', scale: 'minor pentatonic' },
  cycle: { low: 33, high: 45 },
}

/** A complete preset for a drill, with every default of the shared schema. */
export const defaultPreset = (drill: DrillId): DrillPreset =>
  DrillPresetSchema.parse({ drill, settings: REQUIRED[drill] })

const fret = (path: string, label: string): FieldSpec => ({
  path,
  label,
  kind: 'number',
  min: 0,
  max: 24,
})
const LENGTH: FieldSpec[] = [
  {
    path: 'questionCount',
    label: 'Questions per session',
    kind: 'number',
    min: 1,
    max: 500,
    nullable: true,
    advanced: true,
  },
  {
    path: 'timeLimitMinutes',
    label: 'Time limit (minutes)',
    kind: 'number',
    min: 1,
    max: 60,
    nullable: true,
    advanced: true,
  },
]

export const DRILL_FIELDS: Record<DrillId, FieldSpec[]> = {
  recall: [
    {
      path: 'region.lowString',
      label: 'From string (1 = lowest)',
      kind: 'number',
      min: 1,
      max: 10,
      offset: 1,
    },
    { path: 'region.highString', label: 'To string', kind: 'number', min: 1, max: 10, offset: 1 },
    fret('region.lowFret', 'From fret'),
    fret('region.highFret', 'To fret'),
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
    {
      path: 'spellInKey',
      label: 'Only the spelling of the key counts',
      kind: 'switch',
      advanced: true,
    },
    { path: 'keyTonic', label: 'Key', kind: 'tonic', advanced: true },
    { path: 'keyScale', label: 'Key scale', kind: 'scale', advanced: true },
    { path: 'focus', label: 'Ask weak spots more often', kind: 'switch', advanced: true },
    ...LENGTH,
  ],
  hunt: [
    fret('lowFret', 'From fret'),
    fret('highFret', 'To fret'),
    { path: 'findAll', label: 'Find every place', kind: 'switch' },
    { path: 'showName', label: 'Show the note name', kind: 'switch', advanced: true },
    { path: 'focus', label: 'Ask weak spots more often', kind: 'switch', advanced: true },
    ...LENGTH,
  ],
  runs: [
    { path: 'tonic', label: 'Key', kind: 'tonic' },
    { path: 'scale', label: 'Scale', kind: 'scale' },
    fret('lowFret', 'From fret'),
    fret('highFret', 'To fret'),
    {
      path: 'maxPerString',
      label: 'Most notes per string',
      kind: 'number',
      min: 1,
      max: 8,
      advanced: true,
    },
    {
      path: 'handSpan',
      label: 'Hand span (frets)',
      kind: 'number',
      min: 2,
      max: 8,
      advanced: true,
    },
    {
      path: 'showFingering',
      label: 'Show the fingering while playing',
      kind: 'switch',
      advanced: true,
    },
    ...LENGTH,
  ],
  scatter: [
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
      nullable: true,
      advanced: true,
    },
    ...LENGTH,
  ],
  cycle: [
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
    { path: 'click', label: 'Metronome click', kind: 'switch', advanced: true },
    ...LENGTH,
  ],
}

export const DRILL_CHOICES = DRILL_IDS

export function getPath(settings: object, path: string): unknown {
  return path
    .split('.')
    .reduce<unknown>(
      (value, key) => (value as Record<string, unknown> | undefined)?.[key],
      settings,
    )
}

/** A copy of the settings with one value replaced. */
export function setPath<T extends object>(settings: T, path: string, value: unknown): T {
  const [head, ...rest] = path.split('.') as [string, ...string[]]
  const current = settings as Record<string, unknown>
  const next = rest.length ? setPath((current[head] ?? {}) as object, rest.join('.'), value) : value
  return { ...current, [head]: next } as T
}

/** The fields of a drill that its current settings have (so a schema change never shows a stray field). */
export function fieldsFor(preset: DrillPreset): FieldSpec[] {
  return DRILL_FIELDS[preset.drill].filter(
    (f) =>
      getPath(preset.settings, f.path) !== undefined &&
      (!f.when || getPath(preset.settings, f.when.path) === f.when.equals),
  )
}
