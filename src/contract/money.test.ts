// Money in minor units: exponents and rounding per currency. Source of the exponents: ISO 4217
// (table A.1, column "Minor unit"): EUR 2, USD 2, JPY 0, KRW 0, KWD 3, BHD 3.
import { describe, expect, it } from 'vitest'
import {
  allocate,
  decimalToMinor,
  formatMoney,
  minorExponent,
  minorToDecimal,
  perLesson,
} from './money'

describe('minor-unit exponents (ISO 4217)', () => {
  it.each([
    ['EUR', 2], // ISO 4217: euro, 2 decimals
    ['USD', 2], // ISO 4217: US dollar, 2
    ['JPY', 0], // ISO 4217: yen, 0
    ['KWD', 3], // ISO 4217: Kuwaiti dinar, 3
    ['BHD', 3], // ISO 4217: Bahraini dinar, 3
    ['KRW', 0], // ISO 4217: South Korean won, 0
  ])('%s has %i decimal places', (code, exponent) => {
    expect(minorExponent(code)).toBe(exponent)
  })

  it('refuses a code we do not bill in', () => {
    expect(() => minorExponent('XAU')).toThrow(RangeError)
  })
})

describe('decimal text ↔ minor units, without floats', () => {
  it.each([
    ['0.10', 'EUR', 10],
    ['0.20', 'EUR', 20],
    ['0.30', 'EUR', 30], // 0.1 + 0.2 ≠ 0.3 in binary floats; here it is exact
    ['45', 'EUR', 4500],
    ['12.5', 'USD', 1250],
    ['1200', 'JPY', 1200],
    ['1.234', 'KWD', 1234],
    ['0,5', 'EUR', 50],
  ])('%s %s is %i minor units', (text, code, minor) => {
    expect(decimalToMinor(text, code)).toBe(minor)
    expect(decimalToMinor(minorToDecimal(minor, code), code)).toBe(minor)
  })

  it.each([
    ['12.345', 'EUR'],
    ['1.5', 'JPY'],
    ['1.2345', 'KWD'],
    ['-3', 'EUR'],
    ['1e3', 'EUR'],
  ])('refuses %s %s rather than rounding it', (text, code) => {
    expect(() => decimalToMinor(text, code)).toThrow(RangeError)
  })

  it.each([
    [5, 'EUR', '0.05'],
    [123456, 'KWD', '123.456'],
    [7, 'KWD', '0.007'],
    [1500, 'JPY', '1500'],
    [-250, 'USD', '-2.50'],
  ])('%i minor units of %s read %s', (minor, code, text) => {
    expect(minorToDecimal(minor, code)).toBe(text)
  })
})

describe('display with Intl.NumberFormat', () => {
  it.each([
    [4500, 'EUR', 'en-IE', '€45.00'],
    [4500, 'EUR', 'de-DE', '45,00\u00a0€'],
    [1500, 'JPY', 'en-US', '¥1,500'],
    [12500, 'KWD', 'en-US', 'KWD\u00a012.500'],
    // Beyond 2^53 / 100 a float would lose the cents; the decimal text keeps them.
    [900719925474099, 'USD', 'en-US', '$9,007,199,254,740.99'],
  ])('%i %s in %s is %s', (minor, code, locale, text) => {
    expect(formatMoney(minor, code, locale)).toBe(text)
  })
})

describe('rounding per currency', () => {
  it.each([
    [1000, 3, [334, 333, 333]], // €10.00 in three: cents add up to the total
    [100, 3, [34, 33, 33]], // ¥100 in three: whole yen
    [10000, 3, [3334, 3333, 3333]], // KWD 10.000 in three: whole fils
    [7, 7, [1, 1, 1, 1, 1, 1, 1]],
  ])('allocate(%i, %i) gives %j, adding up exactly', (minor, parts, expected) => {
    expect(allocate(minor, parts)).toEqual(expected)
    expect(allocate(minor, parts).reduce((a, b) => a + b, 0)).toBe(minor)
  })

  it.each([
    [40000, 10, 4000], // €400.00 package of 10: €40.00 a lesson
    [10000, 3, 3333], // €100 / 3 = 33.333… → 33.33 (half up, common practice, no source)
    [20000, 3, 6667], // 66.666… → 66.67
    [5, 2, 3], // 2.5 minor units → 3 (half up)
    [1000, 3, 333], // ¥1000 / 3 = 333.3 → ¥333
    [10000, 6, 1667], // KWD 10.000 / 6 = 1.6666… → 1.667
  ])('perLesson(%i, %i) is %i', (minor, lessons, expected) => {
    expect(perLesson(minor, lessons)).toBe(expected)
  })
})
