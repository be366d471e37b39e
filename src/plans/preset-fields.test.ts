// The plan editor's drill forms: defaults come from the shared drill schemas; every field points at
// a setting the schema has.
import { describe, expect, it } from 'vitest'
import { DRILL_IDS, DrillPresetSchema, type DrillPreset } from '../contract/drills'
import { DRILL_FIELDS, defaultPreset, fieldsFor, getPath, setPath } from './preset-fields'

describe('plan editor drill forms', () => {
  it.each(DRILL_IDS)(
    'the default %s preset passes the shared schema and every field is a setting',
    (drill) => {
      const preset = defaultPreset(drill)
      expect(DrillPresetSchema.safeParse(preset).success).toBe(true)
      const missing = DRILL_FIELDS[drill].filter(
        (f) => f.path !== 'customTonics' && getPath(preset.settings, f.path) === undefined,
      )
      expect(missing.map((f) => f.path)).toEqual([])
    },
  )

  it('sets nested values without touching the original', () => {
    const preset = defaultPreset('recall')
    const changed = setPath(preset.settings, 'region.highFret', 9)
    expect(getPath(changed, 'region.highFret')).toBe(9)
    expect(getPath(changed, 'region.lowFret')).toBe(0)
    expect(getPath(preset.settings, 'region.highFret')).toBe(5)
  })

  it('shows the custom key list only for a custom cycle', () => {
    const fourths = defaultPreset('cycle')
    expect(fieldsFor(fourths).map((f) => f.path)).not.toContain('customTonics')
    const custom = { ...fourths, settings: { ...fourths.settings, cycle: 'custom' } } as DrillPreset
    expect(fieldsFor(custom).map((f) => f.path)).toContain('customTonics')
  })
})
