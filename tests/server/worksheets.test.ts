// /api/worksheets: printable PDFs, read back with pdf.js (text, page sizes) and by their structure
// (embedded fonts). Expected note names are computed here: open string + fret (arithmetic).
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import {
  countFingerings,
  cycleTonics,
  keyCycleInWindow,
  octaveScatter,
  rangeRun,
  toUnicode,
} from '../../src/theory'
import { signedInAgent, startTestApi, type TestApi } from '../helpers/api'
import { binary, embeddedFonts, readPdf, tokenRows } from '../helpers/pdf-reader'

let api: TestApi
let agent: Awaited<ReturnType<typeof signedInAgent>>['agent']
beforeAll(async () => {
  api = await startTestApi()
  agent = (await signedInAgent(api.app, 'teacher')).agent
})
afterAll(() => api.close())

const NECK = '/api/worksheets/neck.pdf?tuning=E1,A1,D2,G2&from=0&to=12&answers=1'
// Scientific pitch notation with MIDI numbers (MIDI 1.0): E1 = 28, A1 = 33, D2 = 38, G2 = 43.
const BASS = [28, 33, 38, 43]
const SHARPS = ['C', 'C#', 'D', 'D#', 'E', 'F', 'F#', 'G', 'G#', 'A', 'A#', 'B']
const FLATS = ['C', 'Db', 'D', 'Eb', 'E', 'F', 'Gb', 'G', 'Ab', 'A', 'Bb', 'B']

async function pdf(path: string) {
  const res = await agent.get(path).buffer(true).parse(binary)
  expect(res.status, String(res.body)).toBe(200)
  expect(res.headers['content-type']).toBe('application/pdf')
  expect((res.body as Buffer).subarray(0, 5).toString()).toBe('%PDF-')
  return { res, bytes: res.body as Buffer, pages: await readPdf(res.body as Buffer) }
}

/** The rows of an answer key that start with a string name, lowest string first. */
function stringRows(page: { items: Parameters<typeof tokenRows>[0] }, names: string[]) {
  return tokenRows(page.items)
    .filter((row) => names.includes(row[0] ?? '') && row.length > 2)
    .reverse()
}

describe('GET /api/worksheets/neck.pdf', () => {
  it('when a teacher asks for a 4-string bass neck, frets 0–12, with answers, then an A4 sheet and an answer key come back', async () => {
    const { res, pages } = await pdf(NECK)
    expect(res.headers['content-disposition']).toMatch(
      /attachment; filename="neck-E1-A1-D2-G2-frets-0-12\.pdf"/,
    )
    expect(pages).toHaveLength(2)
    // A4 = 210 × 297 mm = 595.28 × 841.89 pt (ISO 216; 1 pt = 1/72 in).
    for (const page of pages) {
      expect(page.width).toBeCloseTo(595.28, 1)
      expect(page.height).toBeCloseTo(841.89, 1)
    }
    expect(pages[0]!.text).toContain('Name the notes on the neck')
    expect(pages[0]!.text).not.toContain('Answer key')
    expect(pages[1]!.text).toContain('Answer key')
  })

  it('when the answer key is read back, then every cell holds open string + fret, named with sharps (arithmetic)', async () => {
    const { pages } = await pdf(NECK)
    const rows = stringRows(pages[1]!, ['E', 'A', 'D', 'G'])
    expect(rows).toHaveLength(4)
    rows.forEach((row, string) => {
      const expected = Array.from({ length: 13 }, (_, fret) => SHARPS[(BASS[string]! + fret) % 12]!)
      expect(row).toEqual([SHARPS[BASS[string]! % 12], ...expected.map(toUnicode)])
    })
    // ♯ reaches the text layer: the accidental font maps its glyph back to U+266F.
    expect(pages[1]!.text).toContain('G♯')
  })

  it('when flats and octaves are asked for, then names carry them: G string fret 1 is A♭2 (43 + 1 = 44)', async () => {
    const { pages } = await pdf(`${NECK}&accidentals=flat&octaves=1`)
    const rows = stringRows(pages[1]!, ['E', 'A', 'D', 'G'])
    const octave = (pitch: number) => Math.floor(pitch / 12) - 1
    const gString = Array.from({ length: 13 }, (_, fret) => {
      const pitch = 43 + fret
      return toUnicode(`${FLATS[pitch % 12]}${octave(pitch)}`)
    })
    expect(rows[3]!.slice(1)).toEqual(gString)
    expect(pages[1]!.text).toContain('A♭2')
  })

  it('when the PDF is parsed, then Roboto and the accidental font are embedded', async () => {
    const { bytes } = await pdf(NECK)
    const fonts = embeddedFonts(bytes)
    expect(fonts.names).toEqual(
      expect.arrayContaining(['Roboto-Regular', 'Roboto-Bold', 'DejaVuSans']),
    )
    expect(fonts.fontFiles).toBeGreaterThanOrEqual(3)
  })

  it('when US Letter, two pages and a circled quiz are asked for, then every page is 612 × 792 pt and the answers follow', async () => {
    const { pages } = await pdf(
      '/api/worksheets/neck.pdf?tuning=E2,A2,D3,G3,B3,E4&to=15&paper=letter&pages=2&quiz=10&answers=1&perPage=3',
    )
    expect(pages).toHaveLength(4)
    for (const page of pages) expect([page.width, page.height]).toEqual([612, 792])
    expect(pages[0]!.text).toContain('name the 10 circled notes')
    expect(pages[2]!.text).toContain('Answer key')
  })

  it('when nobody is signed in, then 401', async () => {
    const res = await request(api.app).get(NECK)
    expect(res.status).toBe(401)
  })

  it('when parameters are bad, then 400 with a clear message and an error per field', async () => {
    const res = await agent.get(
      '/api/worksheets/neck.pdf?tuning=E1,Q2&from=9&to=3&paper=a3&answers=maybe',
    )
    expect(res.status).toBe(400)
    expect(res.body.error.message).toBe('Some fields need attention.')
    expect(res.body.error.fields['query.tuning']![0]).toMatch(/"Q2" is not a note name/)
    expect(res.body.error.fields['query.paper']).toEqual(['Choose a4 or letter.'])
    expect(res.body.error.fields['query.answers']).toEqual(['Use 1 (yes) or 0 (no).'])
    const order = await agent.get('/api/worksheets/neck.pdf?from=9&to=3')
    expect(order.body.error.fields['query.to']).toEqual(['The last fret must be above the first.'])
    const down = await agent.get('/api/worksheets/neck.pdf?tuning=G2,D2')
    expect(down.body.error.fields['query.tuning']).toEqual([
      'List the open strings lowest-pitched first.',
    ])
  })
})

describe('the other sheets', () => {
  it('when a Window Cycle sheet is asked for, then every key and its start note are listed in cycle order', async () => {
    const { res, pages } = await pdf('/api/worksheets/cycle.pdf?low=E1&high=C3&scale=major')
    const keys = keyCycleInWindow({
      low: 28,
      high: 48,
      tonics: cycleTonics('fourths', { scale: 'major' }),
      scale: 'major',
    })
    const rows = tokenRows(pages[0]!.items)
    keys.forEach((key, i) => {
      const row = rows.find((r) => r[0] === `${i + 1}.`)
      expect(row).toEqual([
        `${i + 1}.`,
        toUnicode(key.tonic),
        toUnicode(key.names[0]!),
        ...key.names.map(toUnicode),
      ])
    })
    expect(pages[0]!.text).toContain('Window E1–C3')
    expect(res.headers['content-disposition']).toContain('window-cycle-major-E1-C3.pdf')
  })

  it("when the window misses a note of the keys, then 400 with the theory core's message", async () => {
    const res = await agent.get('/api/worksheets/cycle.pdf?low=E1&high=G1')
    expect(res.status).toBe(400)
    expect(res.body.error.message).toMatch(/The window E1–G1 is missing .*; widen it/)
  })

  it("when an Octave Scatter sheet with a seed is asked for, then each sequence is the theory core's, and the answers fill the TAB", async () => {
    const { pages } = await pdf(
      '/api/worksheets/scatter.pdf?tonic=A&scale=minor&seed=40&count=3&answers=1&frets=20',
    )
    expect(pages).toHaveLength(2)
    const rows = tokenRows(pages[0]!.items)
    for (let k = 0; k < 3; k += 1) {
      const expected = octaveScatter({
        low: 28,
        high: 63,
        tonic: 'A',
        scale: 'minor',
        minDisplaced: 2,
        seed: 40 + k,
      })
      expect(rows).toContainEqual(expected.names.map(toUnicode))
    }
    // The answer page writes a fret for every note: 3 sequences × 8 notes of digits on TAB lines.
    const frets = tokenRows(pages[1]!.items)
      .flat()
      .filter((word) => /^\d+$/.test(word))
    expect(frets.length).toBeGreaterThanOrEqual(24)
  })

  it('when a Range Run sheet is asked for, then the run and its fingerings are printed', async () => {
    const { pages } = await pdf(
      '/api/worksheets/runs.pdf?tonic=G&scale=major&lowFret=2&highFret=5&count=2&paper=letter',
    )
    expect(pages).toHaveLength(1)
    // G major, frets 2–5 on E1 A1 D2 G2: F#1 (28 + 2) up to C3 (43 + 5), every scale pitch between.
    expect(pages[0]!.text).toContain('Run: F♯1 G1 A1 B1 C2 D2 E2 F♯2 G2 A2 B2 C3')
    expect(pages[0]!.text).toMatch(/1\. \d(-\d)+ from the E string/)
    // As many fingerings as the theory core offers in that position (fewest shifts first), at most 2.
    const neck = { tuning: [28, 33, 38, 43], frets: 24, lowFret: 2, highFret: 5, maxPerString: 4 }
    const run = rangeRun({ ...neck, tonic: 'G', scale: 'major' })
    const offered = countFingerings({ ...neck, run, handSpan: 4 })
    expect(pages[0]!.text).toContain(`${Math.min(2, offered)} of ${offered} fingerings`)
  })

  it('when a region is reversed or the key unknown, then 400 per field', async () => {
    const key = await agent.get('/api/worksheets/runs.pdf?tonic=H')
    expect(key.status).toBe(400)
    expect(key.body.error.fields['query.tonic']![0]).toMatch(/"H" is not a key tonic/)
    const region = await agent.get('/api/worksheets/runs.pdf?lowFret=7&highFret=3')
    expect(region.status).toBe(400)
    expect(region.body.error.fields['query.highFret']).toEqual([
      'The region ends before it starts.',
    ])
  })

  it('when a Chord Tones answer key is asked for, then each arpeggio in the position is printed with its places', async () => {
    const { res, pages } = await pdf(
      '/api/worksheets/chords.pdf?tuning=E1,A1,D2,G2&frets=20&lowFret=2&highFret=6&count=3&answers=1',
    )
    const text = pages[0]!.text
    expect(text).toContain('Chord Tones: major ii–V–I from C')
    expect(text).toContain('Answer key')
    // Dm7 = D F A C, degrees 1 b3 5 b7 (OMT v2 "Seventh Chords"); in frets 2–6 from D2 up:
    // D2 = A string fret 5, F2 = D string fret 3, A2 = G string fret 2, C3 = G string fret 5
    // (open string + fret, arithmetic: 33 + 5, 38 + 3, 43 + 2, 43 + 5)
    expect(text).toContain('D (1) F (♭3) A (5) C (♭7)')
    expect(text).toMatch(/D2 F2 A2 C3/)
    expect(text).toMatch(/A 5 D 3 G 2 G 5/)
    // G7 from G1 (E string fret 3): G1 B1 D2 F2 G2 B2
    expect(text).toMatch(/G1 B1 D2 F2 G2 B2/)
    expect(res.headers['content-disposition']).toContain('chord-tones-two-five-one-C-frets-2-6.pdf')
  })

  it('when the chord list does not parse or the position holds no bass note, then 400', async () => {
    const bad = await agent.get('/api/worksheets/chords.pdf?progression=custom&chords=Am7,Gxx9')
    expect(bad.status).toBe(400)
    expect(bad.body.error.message).toMatch(
      /Chord 2 of the progression: "Gxx9" is not a chord symbol/,
    )
    const empty = await agent.get('/api/worksheets/chords.pdf?progression=custom')
    expect(empty.body.error.fields['query.chords']).toEqual(['List the chords, e.g. Am7 D7 Gmaj7.'])
    const narrow = await agent.get('/api/worksheets/chords.pdf?lowFret=0&highFret=1&frets=20')
    expect(narrow.status).toBe(400)
    expect(narrow.body.error.message).toMatch(/Frets 0–1 hold no/)
  })
})
