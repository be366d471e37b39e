// Reads our MusicXML back with a general XML parser (fast-xml-parser), independently of the writer:
// every sounding note of each part with its string and fret, plus the part's clef and transposition.
import { XMLParser } from 'fast-xml-parser'

export interface ReadNote {
  pitch: number
  writtenPitch: number
  string?: number
  fret?: number
  durations: number[]
}

export interface ReadPart {
  id: string
  clef: { sign: string; line: number; octaveChange: number }
  transposeOctaves: number
  staffTuning: { line: number; pitch: number }[]
  /** Every key signature met, in order (fifths). */
  keys: number[]
  notes: ReadNote[]
  measureCount: number
}

const ARRAYS = new Set([
  'part',
  'measure',
  'attributes',
  'note',
  'score-part',
  'staff-tuning',
  'tie',
  'direction',
])
const CHROMA: Record<string, number> = { C: 0, D: 2, E: 4, F: 5, G: 7, A: 9, B: 11 }

// Scientific pitch notation (ASA 1939) with MIDI numbering (MIDI 1.0): C4 = 60, octave changes at C.
export const midiOf = (step: string, alter: number, octave: number) =>
  12 * (octave + 1) + (CHROMA[step] ?? NaN) + alter

type Node = Record<string, unknown>
const num = (value: unknown, fallback = 0) => (value === undefined ? fallback : Number(value))
const list = (value: unknown) => (Array.isArray(value) ? (value as Node[]) : [])

export function parseMusicXml(xml: string): Node {
  const parser = new XMLParser({
    ignoreAttributes: false,
    attributeNamePrefix: '@',
    isArray: (name) => ARRAYS.has(name),
  })
  return parser.parse(xml) as Node
}

function readAttributes(part: ReadPart, attributes: Node) {
  const clef = attributes.clef as Node | undefined
  if (clef) {
    part.clef = {
      sign: String(clef.sign),
      line: num(clef.line),
      octaveChange: num(clef['clef-octave-change']),
    }
  }
  const transpose = attributes.transpose as Node | undefined
  if (transpose) part.transposeOctaves = num(transpose['octave-change'])
  const key = attributes.key as Node | undefined
  if (key) part.keys.push(num(key.fifths))
  const details = attributes['staff-details'] as Node | undefined
  for (const tuning of list(details?.['staff-tuning'])) {
    const pitch = midiOf(
      String(tuning['tuning-step']),
      num(tuning['tuning-alter']),
      num(tuning['tuning-octave']),
    )
    part.staffTuning.push({ line: num(tuning['@line']), pitch })
  }
}

function readNote(part: ReadPart, note: Node) {
  if (note.rest !== undefined) return
  const pitch = note.pitch as Node
  const written = midiOf(String(pitch.step), num(pitch.alter), num(pitch.octave))
  const ties = list(note.tie).map((tie) => String(tie['@type']))
  const duration = num(note.duration)
  if (ties.includes('stop')) {
    part.notes.at(-1)?.durations.push(duration)
    return
  }
  const technical = (note.notations as Node | undefined)?.technical as Node | undefined
  part.notes.push({
    writtenPitch: written,
    pitch: written + 12 * part.transposeOctaves,
    ...(technical ? { string: num(technical.string), fret: num(technical.fret) } : {}),
    durations: [duration],
  })
}

/** Every part of a score with its notes (tied pieces joined into one note). */
export function readParts(xml: string): ReadPart[] {
  const score = parseMusicXml(xml)['score-partwise'] as Node
  return list(score.part).map((partNode) => {
    const part: ReadPart = {
      id: String(partNode['@id']),
      clef: { sign: '', line: 0, octaveChange: 0 },
      transposeOctaves: 0,
      staffTuning: [],
      keys: [],
      notes: [],
      measureCount: list(partNode.measure).length,
    }
    for (const measure of list(partNode.measure)) {
      for (const attributes of list(measure.attributes)) readAttributes(part, attributes)
      for (const note of list(measure.note)) readNote(part, note)
    }
    return part
  })
}
