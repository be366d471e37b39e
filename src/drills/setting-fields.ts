// How a drill setting is edited in the plan editor: the kinds of field, and the fields every drill
// shares (frets, the session length). Each drill lists its own in its definition.
export type FieldKind =
  'number' | 'switch' | 'select' | 'tonic' | 'scale' | 'pitch' | 'tonics' | 'text'

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
  /** What an empty nullable choice means ("first key of the cycle"). */
  emptyText?: string
  options?: { title: string; value: string }[]
  advanced?: boolean
  /** Only shown when another setting has a value (e.g. custom keys when the cycle is custom). */
  when?: { path: string; equals: unknown }
}

export const fretField = (path: string, label: string): FieldSpec => ({
  path,
  label,
  kind: 'number',
  min: 0,
  max: 24,
})

export const switchField = (path: string, label: string, advanced = false): FieldSpec => ({
  path,
  label,
  kind: 'switch',
  ...(advanced ? { advanced } : {}),
})

/** Questions per session and the time limit, under "More settings". */
export const LENGTH_FIELDS: FieldSpec[] = [
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

/** "Ask weak spots more often": the drills that use the focus selector for their questions. */
export const FOCUS_FIELD = switchField('focus', 'Ask weak spots more often', true)
