// Money as integer minor units of an ISO 4217 currency: the currency table (minor-unit exponents),
// conversions between minor units and decimal text without floats, display with Intl.NumberFormat,
// and splitting an amount into parts that add up to it exactly.

/**
 * Currencies a studio may bill in, with their minor-unit exponent as ISO 4217 lists it
 * (ISO 4217:2015, table A.1 "Current currency & funds code list", column "Minor unit"). Left out:
 * currencies whose minor unit the payment service counts differently from ISO 4217 (ISK).
 */
export const CURRENCY_EXPONENTS = {
  AUD: 2,
  BHD: 3,
  CAD: 2,
  CHF: 2,
  CZK: 2,
  DKK: 2,
  EUR: 2,
  GBP: 2,
  HUF: 2,
  JOD: 3,
  JPY: 0,
  KRW: 0,
  KWD: 3,
  NOK: 2,
  NZD: 2,
  OMR: 3,
  PLN: 2,
  SEK: 2,
  USD: 2,
} as const

export type CurrencyCode = keyof typeof CURRENCY_EXPONENTS
export const CURRENCY_CODES = Object.keys(CURRENCY_EXPONENTS) as CurrencyCode[]

/** The largest amount a price or invoice may hold, in minor units (fits a 32-bit column). */
export const MAX_MINOR = 1_000_000_000

/**
 * The minor-unit exponent of a currency (2 for EUR: 1 euro = 100 cents).
 * @example minorExponent('JPY') // 0
 */
export function minorExponent(currency: string): number {
  const exponent = CURRENCY_EXPONENTS[currency as CurrencyCode]
  if (exponent === undefined) throw new RangeError(`${currency} is not a currency we bill in.`)
  return exponent
}

/**
 * Minor units as exact decimal text in major units, no floats involved.
 * @example minorToDecimal(123456, 'KWD') // '123.456'
 */
export function minorToDecimal(minor: number, currency: string): string {
  if (!Number.isSafeInteger(minor))
    throw new RangeError('An amount is a whole number of minor units.')
  const exponent = minorExponent(currency)
  const digits = Math.abs(minor)
    .toString()
    .padStart(exponent + 1, '0')
  const whole = digits.slice(0, digits.length - exponent)
  const fraction = exponent ? `.${digits.slice(-exponent)}` : ''
  return `${minor < 0 ? '-' : ''}${whole}${fraction}`
}

/**
 * Decimal text in major units ("12.5", "1,200.00" is refused: digits and one point only) as minor
 * units; more decimals than the currency has are refused rather than rounded.
 * @example decimalToMinor('12.5', 'EUR') // 1250
 */
export function decimalToMinor(text: string, currency: string): number {
  const exponent = minorExponent(currency)
  const match = /^(\d+)(?:[.,](\d*))?$/.exec(text.trim())
  if (!match) throw new RangeError('Write the amount with digits, like 45.00.')
  const fraction = match[2] ?? ''
  if (fraction.length > exponent)
    throw new RangeError(
      exponent === 0
        ? `${currency} has no decimal places.`
        : `${currency} has ${exponent} decimal places.`,
    )
  const minor = Number(match[1]! + fraction.padEnd(exponent, '0'))
  if (!Number.isSafeInteger(minor) || minor > MAX_MINOR)
    throw new RangeError('That amount is too large.')
  return minor
}

/**
 * An amount for people to read, in the locale's style, always with the currency's decimals.
 * @example formatMoney(4500, 'EUR', 'en-IE') // '€45.00'
 */
export function formatMoney(minor: number, currency: string, locale = 'en'): string {
  const exponent = minorExponent(currency)
  const format = new Intl.NumberFormat(locale, {
    style: 'currency',
    currency,
    minimumFractionDigits: exponent,
    maximumFractionDigits: exponent,
  })
  // A decimal string is formatted exactly (no binary float in between).
  return format.format(minorToDecimal(minor, currency) as unknown as number)
}

/**
 * Splits an amount into `parts` whole minor units that add up to it exactly: every part gets the
 * rounded-down share and the first ones one unit more until the remainder is used up.
 * @example allocate(1000, 3) // [334, 333, 333]
 */
export function allocate(minor: number, parts: number): number[] {
  if (!Number.isSafeInteger(minor) || minor < 0) throw new RangeError('Give whole minor units.')
  if (!Number.isInteger(parts) || parts < 1) throw new RangeError('Split into at least one part.')
  const share = Math.floor(minor / parts)
  const rest = minor - share * parts
  return Array.from({ length: parts }, (_, i) => share + (i < rest ? 1 : 0))
}

/**
 * A price per lesson from a package price, rounded half up to the currency's minor unit.
 * @example perLesson(10000, 3) // 3333
 */
export function perLesson(minor: number, lessons: number): number {
  if (!Number.isInteger(lessons) || lessons < 1) throw new RangeError('A package has lessons.')
  return Math.floor((2 * minor + lessons) / (2 * lessons))
}
