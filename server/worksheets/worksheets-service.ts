// Worksheet use cases: read the theory core for what a sheet shows, then lay it out as a PDF.
import {
  chordArpeggioInRegion,
  chordTonesInRegion,
  countFingerings,
  customCycle,
  cycleTonics,
  fingeringsOf,
  instrumentRange,
  keyCycleInWindow,
  octaveScatter,
  pitchName,
  rangeRun,
  spellInKey,
  stringNames,
  toUnicode,
  windowFromFrets,
  type CycleId,
} from '../../src/theory'
import { playedChords, type PlayedChord } from '../../src/contract/drills'
import { chordsSheet, degreeGlyphs, type ChordRow } from './sheets/chords-sheet'
import { cycleSheet } from './sheets/cycle-sheet'
import { neckSheet } from './sheets/neck-sheet'
import { runsSheet } from './sheets/runs-sheet'
import { scatterSheet } from './sheets/scatter-sheet'
import type {
  ChordsQuery,
  CycleQuery,
  NeckQuery,
  RunsQuery,
  ScatterQuery,
} from '../../src/contract/worksheets'

/** A finished worksheet: the PDF and the name it is saved under. */
export interface Worksheet {
  fileName: string
  pdf: Buffer
}

/** Above this many fingerings a run sheet asks for a smaller region (listing them would stall). */
const MAX_FINGERINGS = 20_000

const slug = (...parts: (string | number)[]) =>
  parts
    .join('-')
    .replace(/#/g, 'sharp')
    .replace(/[^A-Za-z0-9-]+/g, '-')
    .replace(/-+/g, '-')

export async function neckWorksheet(query: NeckQuery): Promise<Worksheet> {
  const pdf = await neckSheet({
    ...query,
    perPage: query.perPage ?? null,
    title: query.title ?? null,
  })
  const strings = query.tuning.map((pitch) => pitchName(pitch)).join('-')
  return { fileName: `${slug('neck', strings, 'frets', query.from, query.to)}.pdf`, pdf }
}

function cycleKeysOf(query: CycleQuery): string[] {
  if (query.cycle === 'custom')
    return customCycle((query.tonics ?? '').split(/[\s,]+/).filter(Boolean))
  return cycleTonics(query.cycle as CycleId, {
    scale: query.scale,
    ...(query.start ? { start: query.start } : {}),
  })
}

export async function cycleWorksheet(query: CycleQuery): Promise<Worksheet> {
  // Without a window: the first five frets of the neck, as the drill starts a new student.
  const frets = windowFromFrets({
    tuning: query.tuning,
    lowFret: 0,
    highFret: Math.min(4, query.frets),
  })
  const low = query.low ?? frets.low
  const high = query.high ?? frets.high
  const keys = keyCycleInWindow({ low, high, tonics: cycleKeysOf(query), scale: query.scale })
  const cycleName = query.cycle === 'custom' ? 'your own order' : `the cycle of ${query.cycle}`
  const pdf = await cycleSheet({ ...query, keys, low, high, cycleName, title: query.title ?? null })
  return {
    fileName: `${slug('window-cycle', query.scale, pitchName(low), pitchName(high))}.pdf`,
    pdf,
  }
}

export async function scatterWorksheet(query: ScatterQuery): Promise<Worksheet> {
  const range = instrumentRange(query.tuning, query.frets)
  const low = Math.max(range.low, query.low ?? range.low)
  const high = Math.min(range.high, query.high ?? range.high)
  const first = query.seed ?? Math.floor(Math.random() * 1_000_000)
  const sequences = Array.from({ length: query.count }, (_, k) => {
    const seed = first + k
    const scatter = octaveScatter({
      low,
      high,
      tonic: query.tonic,
      scale: query.scale,
      minDisplaced: query.minDisplaced,
      ...(query.maxLeap === undefined ? {} : { maxLeap: query.maxLeap }),
      seed,
    })
    return { seed, scatter }
  })
  const pdf = await scatterSheet({ ...query, sequences, title: query.title ?? null })
  return { fileName: `${slug('octave-scatter', query.tonic, query.scale, 'seed', first)}.pdf`, pdf }
}

export async function runsWorksheet(query: RunsQuery): Promise<Worksheet> {
  const run = rangeRun(query)
  if (run.length === 0) throw new RangeError('This region holds no note of the scale; widen it.')
  const options = { ...query, run }
  const total = countFingerings(options)
  if (total > MAX_FINGERINGS) {
    throw new RangeError(
      `This run has ${total} fingerings; choose a smaller region or fewer notes per string.`,
    )
  }
  const pdf = await runsSheet({
    ...query,
    run,
    names: run.map((pitch) => spellInKey(pitch, query.tonic, query.scale)),
    fingerings: fingeringsOf(options).slice(0, query.count),
    total,
    scaleLabel: query.scale,
    title: query.title ?? null,
  })
  const region = `frets-${query.lowFret}-${query.highFret}`
  return { fileName: `${slug('range-run', query.tonic, query.scale, region)}.pdf`, pdf }
}

// One chord's row: its tones, its arpeggio in the position and the string and fret of each note.
function chordRow({ chord }: PlayedChord, query: ChordsQuery): ChordRow {
  const region = { tuning: query.tuning, lowFret: query.lowFret, highFret: query.highFret }
  const arpeggio = chordArpeggioInRegion(chord, region)
  const cells = chordTonesInRegion(chord, region)
  const names = stringNames(query.tuning)
  const places = arpeggio.map((tone) => {
    const cell = cells.find((c) => c.pitch === tone.pitch)
    return cell ? `${names[cell.string] ?? ''} ${cell.fret}` : ''
  })
  const tones = chord.tones.map((tone) => `${tone.name} (${degreeGlyphs(tone.degree)})`).join(' ')
  return { symbol: chord.symbol, tones, arpeggio, places }
}

const PROGRESSION_TITLES = { 'two-five-one': 'ii–V–I', blues: '12-bar blues', custom: 'own chords' }
// A minor ii–V–i resolves to a minor chord: lower-case i, as harmony texts write it.
const progressionTitle = (q: ChordsQuery) =>
  q.quality === 'minor' && q.progression === 'two-five-one'
    ? 'ii–V–i'
    : PROGRESSION_TITLES[q.progression]

export async function chordsWorksheet(query: ChordsQuery): Promise<Worksheet> {
  const played = playedChords({ ...query, startKey: query.start, customChords: query.chords })
  const rows = played.slice(0, query.count).map((chord) => chordRow(chord, query))
  const what =
    query.progression === 'custom'
      ? PROGRESSION_TITLES.custom
      : `${query.quality} ${progressionTitle(query)} from ${toUnicode(query.start)}`
  const tuning = query.tuning.map((pitch) => pitchName(pitch)).join(' ')
  const pdf = await chordsSheet({
    rows,
    title: query.title ?? `Chord Tones: ${what}`,
    subtitle: `Frets ${query.lowFret}–${query.highFret} · tuning ${tuning} · ${rows.length} chords`,
    answers: query.answers,
    paper: query.paper,
  })
  const name = slug(
    'chord-tones',
    query.progression,
    query.start,
    'frets',
    query.lowFret,
    query.highFret,
  )
  return { fileName: `${name}.pdf`, pdf }
}
