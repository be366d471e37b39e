// Hostile JSON bodies for the fuzz test, as raw request text: NUL characters, unpaired surrogates,
// huge and odd numbers, deep nesting, prototype keys, and mutations of a route's valid body.
import fc from 'fast-check'

const loneSurrogate = fc
  .integer({ min: 0xd800, max: 0xdfff })
  .map((code) => `a${String.fromCharCode(code)}b`)

const nastyString = fc.oneof(
  fc.string({ unit: 'binary', maxLength: 40 }),
  fc.string({ maxLength: 20 }).map((s) => `${s}\u0000${s}`),
  loneSurrogate,
  fc.constantFrom('', ' ', '\u0000', '\u202e', '../../etc/passwd', "'; drop table users; --"),
  fc.integer({ min: 1000, max: 300_000 }).map((n) => 'x'.repeat(n)),
)

const nastyNumber = fc.oneof(
  fc.double(),
  fc.integer(),
  fc.constantFrom(1e308, -1e308, 2 ** 53 + 1, 2 ** 63, -(2 ** 31) - 1, 5e-324, -0),
)

/** Any JSON value, small, built from the nasty leaves. */
const nastyValue: fc.Arbitrary<unknown> = fc.letrec((tie) => ({
  node: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    nastyString,
    nastyNumber,
    fc.boolean(),
    fc.constant(null),
    fc.array(tie('node'), { maxLength: 4 }),
    fc.dictionary(fc.string({ maxLength: 12 }), tie('node'), { maxKeys: 4 }),
  ),
})).node

/** Raw number literals JSON.stringify would never write: beyond double range, 40 digits. */
const rawNumber = fc.constantFrom(
  '1e999',
  '-1e999',
  '123456789012345678901234567890123456789',
  '0.0000000000000000000000000000000000001',
  '1E+400',
)

/** Nested arrays or objects hundreds to thousands of levels deep. */
const deepNesting = fc
  .tuple(fc.integer({ min: 100, max: 20_000 }), fc.boolean())
  .map(([depth, arrays]) =>
    arrays
      ? '['.repeat(depth) + ']'.repeat(depth)
      : '{"a":'.repeat(depth) + '1' + '}'.repeat(depth),
  )

const PROTO_KEYS = ['__proto__', 'constructor', 'prototype'] as const
const json = (value: unknown) => JSON.stringify(value) ?? 'null'

/** The valid body with one field replaced, dropped, or a prototype key or raw number added. */
function mutations(valid: Record<string, unknown>): fc.Arbitrary<string> {
  const keys = Object.keys(valid)
  const pick = keys.length ? fc.constantFrom(...keys) : fc.constant('extra')
  const withRaw = (key: string, raw: string) => {
    const rest = json({ ...valid, [key]: 0 })
      .slice(1, -1)
      .replace(`"${key}":0`, '')
    return `{"${key}":${raw}${rest && !rest.startsWith(',') ? ',' : ''}${rest}}`
  }
  return fc.oneof(
    fc.tuple(pick, nastyValue).map(([key, value]) => json({ ...valid, [key]: value })),
    pick.map((key) => json(Object.fromEntries(Object.entries(valid).filter(([k]) => k !== key)))),
    fc
      .tuple(fc.constantFrom(...PROTO_KEYS), nastyValue)
      .map(([key, value]) => withRaw(key, json({ role: 'admin', polluted: value }))),
    fc.tuple(pick, rawNumber).map(([key, raw]) => withRaw(key, raw)),
  )
}

/** Request bodies (raw JSON text, sometimes not JSON at all) for one route. */
export function hostileBodies(valid: object | undefined): fc.Arbitrary<string> {
  return fc.oneof(
    nastyValue.map(json),
    deepNesting,
    rawNumber,
    fc.string({ maxLength: 30 }), // often not JSON
    mutations((valid ?? {}) as Record<string, unknown>),
    mutations((valid ?? {}) as Record<string, unknown>),
  )
}
