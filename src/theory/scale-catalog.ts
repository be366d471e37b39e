// The scale list for pickers: curated trade names first, in groups, then every other tonal scale.
import { ScaleType } from 'tonal'
import {
  CURATED_SCALES,
  MORE_SCALE_LABELS,
  SCALE_GROUPS,
  type ScaleGroupId,
  type SignatureFamily,
} from './scale-catalog-data'

/**
 * A scale type the app supports: tonal's name, a label for pickers, its size, its picker group
 * (`common` when curated) and the other names tonal accepts for it.
 *
 * @example
 * SCALE_TYPES.find((type) => type.name === 'dorian')?.label // 'Dorian'
 */
export interface ScaleTypeInfo {
  name: string
  label: string
  noteCount: number
  common: boolean
  aliases: string[]
  group: ScaleGroupId
}

/**
 * One picker group with its heading and scales, in display order.
 *
 * @example
 * scaleCatalog()[0]?.label // 'Major and its modes'
 */
export interface ScaleGroup {
  id: ScaleGroupId
  label: string
  scales: ScaleTypeInfo[]
}

/**
 * A readable name for any tonal scale: the curated trade name, a written-out name for the odd
 * ones, else tonal's name capitalised with ♯/♭ for altered degrees ("dorian b2" → "Dorian ♭2").
 *
 * @example
 * readableScaleName('mystery #1') // 'Mystery scale no. 1'
 * readableScaleName("messiaen's mode #5") // 'Messiaen mode 5'
 * readableScaleName('dorian b2') // 'Dorian ♭2'
 */
export function readableScaleName(name: string): string {
  const curated = CURATED_SCALES.find((scale) => scale.name === name)?.label
  const known = curated ?? MORE_SCALE_LABELS[name]
  if (known) return known
  const text = name
    .replace(/^messiaen's mode #(\d)$/, 'Messiaen mode $1')
    .replace(/ b(\d)/g, ' ♭$1')
    .replace(/ #(\d)/g, ' ♯$1')
  return `${text.charAt(0).toUpperCase()}${text.slice(1)}`
}

function rankOf(name: string): number {
  const index = CURATED_SCALES.findIndex((scale) => scale.name === name)
  return index === -1 ? CURATED_SCALES.length : index
}

/**
 * Every scale type the app supports (all of tonal's): the curated ones first in teaching order,
 * then the rest in tonal's order under "More scales", each with a readable label.
 *
 * @example
 * SCALE_TYPES[0] // { name: 'major', label: 'Major (Ionian)', noteCount: 7, common: true, aliases: ['ionian'], group: 'modes' }
 */
export const SCALE_TYPES: readonly ScaleTypeInfo[] = ScaleType.all()
  .map((type) => {
    const curated = CURATED_SCALES.find((scale) => scale.name === type.name)
    return {
      name: type.name,
      label: readableScaleName(type.name),
      noteCount: type.intervals.length,
      common: curated !== undefined,
      aliases: [...type.aliases],
      group: curated?.group ?? ('more' as const),
    }
  })
  .sort((a, b) => rankOf(a.name) - rankOf(b.name))

/**
 * The scale list for pickers, grouped: major and its modes, the minors, pentatonics and blues,
 * symmetric scales, jazz and colour scales, then "More scales" (the rest of tonal's).
 *
 * @example
 * scaleCatalog().map((group) => group.label) // ['Major and its modes', 'Minor scales', ..., 'More scales']
 */
export function scaleCatalog(): ScaleGroup[] {
  return SCALE_GROUPS.map(({ id, label }) => ({
    id,
    label,
    scales: SCALE_TYPES.filter((type) => type.group === id),
  }))
}

/**
 * Which key signature a scale is written with (see `SignatureFamily`): curated scales as listed;
 * other scales count their own accidentals, except minor-third scales tonal names as minor, which
 * take the natural minor's.
 *
 * @example
 * signatureFamilyOf('melodic minor') // 'minor'
 * signatureFamilyOf('dorian') // 'mode'
 */
export function signatureFamilyOf(scale: string): SignatureFamily {
  const curated = CURATED_SCALES.find((entry) => entry.name === scale)
  if (curated) return curated.family
  const minorThird = ScaleType.get(scale).intervals.includes('3m')
  return minorThird && /\bminor\b/.test(scale) ? 'minor' : 'own'
}
