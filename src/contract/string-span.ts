// Strings counted from the instrument's lowest or highest string ("the two lowest strings"), so a
// plan item means the same on a 4-string bass, a 5-string and a guitar; worked out per instrument.
import { z } from 'zod'

/** Strings an instrument may have at most (PRODUCT: 4 to 8). */
export const MAX_STRINGS = 8
const ORDINALS = ['', '2nd ', '3rd ', '4th ', '5th ', '6th ', '7th ', '8th ']
const refsFrom = (end: 'lowest' | 'highest') =>
  ORDINALS.map((o) => `${o.trim()}${o ? '-' : ''}${end}`)

/** "lowest", "2nd-lowest" … "8th-lowest", "highest", "2nd-highest" … "8th-highest". */
export const STRING_REFS = [...refsFrom('lowest'), ...refsFrom('highest')] as [string, ...string[]]
export const StringRefSchema = z.enum(
  STRING_REFS,
  'Choose a string counted from the lowest or highest.',
)
export type StringRef = z.infer<typeof StringRefSchema>

/** The strings from one reference to another (either order), both included. */
export const StringSpanSchema = z.object({ from: StringRefSchema, to: StringRefSchema })
export type StringSpan = z.infer<typeof StringSpanSchema>

export const ALL_STRINGS: StringSpan = { from: 'lowest', to: 'highest' }

/** Which end a reference counts from and how many strings in (0 = that end's string). */
function parts(ref: StringRef) {
  const end = ref.endsWith('lowest') ? 'lowest' : 'highest'
  return { end, step: ref.includes('-') ? ORDINALS.indexOf(`${ref.split('-')[0]} `) : 0 } as const
}

/**
 * The string index (0 = lowest, as the theory core counts) a reference names on an instrument with
 * `stringCount` strings; may lie outside the instrument ("4th highest" on a 3-string).
 *
 * @example
 * stringIndex('lowest', 5) // 0
 * stringIndex('2nd-highest', 6) // 4
 */
export function stringIndex(ref: StringRef, stringCount: number): number {
  const { end, step } = parts(ref)
  return end === 'lowest' ? step : stringCount - 1 - step
}

/**
 * The concrete strings (0 = lowest) of a span on an instrument, `cut` when part of the span lies
 * beyond its strings (then only the strings it has; none of them at all: the nearest one).
 * A RangeError for a string count no instrument has.
 *
 * @example
 * spanOnInstrument({ from: 'lowest', to: '2nd-lowest' }, 6) // { lowString: 0, highString: 1, cut: false }
 * spanOnInstrument({ from: 'highest', to: 'highest' }, 5) // { lowString: 4, highString: 4, cut: false }
 * spanOnInstrument({ from: 'lowest', to: '6th-lowest' }, 4) // { lowString: 0, highString: 3, cut: true }
 */
export function spanOnInstrument(span: StringSpan, stringCount: number) {
  if (!Number.isInteger(stringCount) || stringCount < 1 || stringCount > MAX_STRINGS + 2)
    throw new RangeError(`An instrument has 1 to ${MAX_STRINGS + 2} strings, not ${stringCount}.`)
  const [a, b] = [stringIndex(span.from, stringCount), stringIndex(span.to, stringCount)]
  const [low, high] = [Math.min(a, b), Math.max(a, b)]
  const onNeck = (index: number) => Math.min(Math.max(index, 0), stringCount - 1)
  const [lowString, highString] = [onNeck(low), onNeck(high)]
  return { lowString, highString, cut: lowString !== low || highString !== high }
}

/**
 * A reference in words.
 *
 * @example
 * stringRefLabel('3rd-highest') // '3rd highest string'
 */
export const stringRefLabel = (ref: StringRef) => `${ref.replace('-', ' ')} string`

/**
 * A span in words, the same on every instrument.
 *
 * @example
 * describeStringSpan({ from: 'lowest', to: 'highest' }) // 'all strings'
 * describeStringSpan({ from: 'lowest', to: '2nd-lowest' }) // 'the 2 lowest strings'
 * describeStringSpan({ from: '2nd-lowest', to: 'highest' }) // 'the 2nd lowest to the highest string'
 */
export function describeStringSpan(span: StringSpan): string {
  const [a, b] = [parts(span.from), parts(span.to)]
  if (a.end !== b.end) {
    if (a.step === 0 && b.step === 0) return 'all strings'
    const [low, high] = a.end === 'lowest' ? [span.from, span.to] : [span.to, span.from]
    return `the ${low.replace('-', ' ')} to the ${stringRefLabel(high)}`
  }
  const count = Math.abs(a.step - b.step) + 1
  if (count === 1) return `the ${stringRefLabel(span.from)}`
  if (Math.min(a.step, b.step) === 0) return `the ${count} ${a.end} strings`
  const [near, far] = a.step < b.step ? [span.from, span.to] : [span.to, span.from]
  return `the ${near.replace('-', ' ')} to the ${stringRefLabel(far)}`
}

/**
 * The span that names absolute strings (0 = lowest) counted from the lowest: what a region with
 * string numbers always meant, kept when stored plans gained relative strings.
 *
 * @example
 * spanFromLowest(0, 3) // { from: 'lowest', to: '4th-lowest' }
 */
export function spanFromLowest(lowString: number, highString: number): StringSpan {
  const ref = (index: number) => STRING_REFS[Math.min(Math.max(index, 0), MAX_STRINGS - 1)]!
  return { from: ref(lowString), to: ref(highString) }
}
