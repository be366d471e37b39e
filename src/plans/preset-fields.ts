// The plan editor's form for each drill: a starting preset (the drill's own defaults, on a standard
// 4-string bass) and the fields a teacher edits, both read from the drill registry.
import { DrillPresetSchema, type DrillId, type DrillPreset } from '../contract/drills'
import { FALLBACK_NECK } from '../drills/engine/useDrillNeck'
import { drillDefinition, DRILLS } from '../drills/registry'
import type { FieldSpec } from '../drills/setting-fields'
import { ALL_STRINGS } from '../contract/string-span'

export type { FieldKind, FieldSpec } from '../drills/setting-fields'

/** What a plan item adds to a drill's own defaults: Neck Recall counts its strings from the ends. */
const PLAN_EXTRAS: Partial<Record<DrillId, object>> = { recall: { strings: ALL_STRINGS } }

/**
 * A complete preset for a drill: the defaults its page starts from on a standard 4-string bass,
 * with what only plans have (strings counted from the lowest or highest).
 */
export const defaultPreset = (drill: DrillId): DrillPreset =>
  DrillPresetSchema.parse({
    drill,
    settings: { ...drillDefinition(drill).defaults(FALLBACK_NECK), ...PLAN_EXTRAS[drill] },
  })

/** Each drill's plan-editor fields. */
export const DRILL_FIELDS = Object.fromEntries(
  Object.values(DRILLS).map((d) => [d.id, d.presetFields]),
) as Record<DrillId, readonly FieldSpec[]>

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
