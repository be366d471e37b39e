// CSV for spreadsheet export (RFC 4180 quoting, CRLF lines, a UTF-8 byte-order mark for Excel).
export type CsvValue = string | number | boolean | null | undefined

// A text cell starting with one of these would run as a formula in a spreadsheet.
const FORMULA_START = /^[=+\-@\t\r]/

function cell(value: CsvValue): string {
  if (value === null || value === undefined) return ''
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : ''
  if (typeof value === 'boolean') return value ? 'yes' : 'no'
  const text = FORMULA_START.test(value) ? `'${value}` : value
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text
}

export function toCsv(header: readonly string[], rows: readonly (readonly CsvValue[])[]): string {
  return '\uFEFF' + [header, ...rows].map((row) => row.map(cell).join(',')).join('\r\n') + '\r\n'
}

/** A file name safe for Content-Disposition: letters, digits, dashes. */
export function csvFileName(...parts: string[]): string {
  const slug = parts
    .join('-')
    .normalize('NFKD')
    .replace(/\p{M}+/gu, '')
    .replace(/[^A-Za-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .toLowerCase()
  return `${slug || 'export'}.csv`
}
