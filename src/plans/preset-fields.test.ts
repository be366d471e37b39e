// The plan editor's drill forms: defaults come from the shared drill schemas; every field points at
// a setting the schema has.
import { describe, expect, it } from 'vitest'
import { DRILL_IDS, DrillPresetSchema, type DrillPreset } from '../contract/drills'
import { FALLBACK_NECK } from '../drills/engine/useDrillNeck'
import { drillDefinition } from '../drills/registry'
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

  it.each(DRILL_IDS)(
    'a new %s item starts from the settings its drill page gives a standard 4-string bass',
    (drill) => {
      const settings = { ...defaultPreset(drill).settings } as { strings?: unknown }
      delete settings.strings // only plans count strings from the ends (tested below)
      expect(settings).toEqual(drillDefinition(drill).defaults(FALLBACK_NECK))
    },
  )

  it('a new Neck Recall item asks for all strings, counted from the ends of any instrument', () => {
    expect(defaultPreset('recall').settings).toMatchObject({
      strings: { from: 'lowest', to: 'highest' },
    })
    expect(fieldsFor(defaultPreset('recall')).map((f) => f.path)).toEqual(
      expect.arrayContaining(['strings.from', 'strings.to']),
    )
  })

  it('Range Runs starts on frets 2–5 and Octave Scatter on C major, as on their pages', () => {
    expect(defaultPreset('runs').settings).toMatchObject({ lowFret: 2, highFret: 5 })
    expect(defaultPreset('scatter').settings).toMatchObject({ tonic: 'C', scale: 'major' })
  })

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
