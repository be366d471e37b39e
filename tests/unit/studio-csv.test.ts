// CSV export: RFC 4180 quoting (fields with commas, quotes or line breaks are quoted; quotes
// doubled), CRLF line ends, and spreadsheet formula injection defused (OWASP "CSV Injection").
import { describe, expect, it } from 'vitest'
import { csvFileName, toCsv } from '../../server/roster/csv'

describe('toCsv', () => {
  it('quotes only what needs quoting and doubles quotes (RFC 4180 §2.6–2.7)', () => {
    const csv = toCsv(
      ['Name', 'Note'],
      [
        ['Ada, Jr.', 'says "hi"'],
        ['Bo', 'two\nlines'],
      ],
    )
    expect(csv).toBe('\uFEFFName,Note\r\n"Ada, Jr.","says ""hi"""\r\nBo,"two\nlines"\r\n')
  })

  it('writes numbers plainly, booleans as yes/no, and nothing for null', () => {
    expect(toCsv(['a', 'b', 'c', 'd'], [[0.75, true, null, -3]])).toBe(
      '\uFEFFa,b,c,d\r\n0.75,yes,,-3\r\n',
    )
  })

  it('prefixes text that a spreadsheet would run as a formula', () => {
    expect(toCsv(['x'], [['=HYPERLINK("http://x")'], ['+1'], ['@SUM(A1)']])).toBe(
      '\uFEFFx\r\n"\'=HYPERLINK(""http://x"")"\r\n\'+1\r\n\'@SUM(A1)\r\n',
    )
  })

  it('makes file names from plain letters and digits', () => {
    expect(csvFileName('Lucía Amari', 'results')).toBe('lucia-amari-results.csv')
    expect(csvFileName('"; rm -rf')).toBe('rm-rf.csv')
  })
})
