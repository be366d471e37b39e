// Amounts typed by people (decimal text in major units) to minor units and back, for the forms.
import { decimalToMinor, minorToDecimal } from '@/contract/money'

/** Minor units, or the reason the text is not an amount in this currency. */
export function readAmount(text: string, currency: string): number | string {
  try {
    return decimalToMinor(String(text), currency)
  } catch (e) {
    return e instanceof RangeError ? e.message : String(e)
  }
}

export const amountText = (minor: number, currency: string) => minorToDecimal(minor, currency)
