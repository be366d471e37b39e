// Query parameters of the worksheet PDFs: zod schemas the server parses with, types the client sends.
import { z } from 'zod'
import { parsePitch, scaleTypeName, tonicName, tuningErrors } from '../theory'

function theoryValue<T>(read: (text: string) => T) {
  return (text: string, ctx: z.RefinementCtx): T => {
    try {
      return read(text.trim())
    } catch (error) {
      ctx.addIssue({ code: 'custom', message: (error as Error).message })
      return z.NEVER
    }
  }
}

function readTuning(text: string): number[] {
  const tuning = text
    .split(/[\s,]+/)
    .filter((name) => name !== '')
    .map(parsePitch)
  const errors = tuningErrors(tuning, 1)
  if (errors.length > 0) throw new RangeError(errors.join(' '))
  return tuning
}

const whole = (min: number, max: number) =>
  z.coerce
    .number({ error: `Give a whole number from ${min} to ${max}.` })
    .int(`Give a whole number from ${min} to ${max}.`)
    .min(min, `Give a whole number from ${min} to ${max}.`)
    .max(max, `Give a whole number from ${min} to ${max}.`)

const Flag = z
  .enum(['0', '1', 'true', 'false'], { error: 'Use 1 (yes) or 0 (no).' })
  .default('0')
  .transform((value) => value === '1' || value === 'true')
/** Open strings lowest first in scientific pitch notation, comma separated: "E1,A1,D2,G2". */
const Tuning = z
  .string({ error: 'List the open strings, lowest first, e.g. E1,A1,D2,G2.' })
  .default('E1,A1,D2,G2')
  .transform(theoryValue(readTuning))
const Pitch = z.string().transform(theoryValue(parsePitch))
const Tonic = z.string().transform(theoryValue(tonicName))
const Scale = z.string().default('major').transform(theoryValue(scaleTypeName))
const Paper = z.enum(['a4', 'letter'], { error: 'Choose a4 or letter.' }).default('a4')
const Title = z.string().trim().min(1).max(80, 'Use at most 80 characters.').optional()
const Frets = whole(1, 30).default(24)

/** The highest fret on the highest string must stay a MIDI note (0–127). */
function reachable(tuning: readonly number[], fret: number) {
  return Math.max(...tuning) + fret <= 127
}

export const NeckQuerySchema = z
  .object({
    tuning: Tuning,
    from: whole(0, 29).default(0),
    to: whole(1, 30).default(12),
    answers: Flag,
    paper: Paper,
    perPage: whole(1, 8).optional(),
    pages: whole(1, 10).default(1),
    quiz: whole(0, 60).default(0),
    seed: whole(0, 2_147_483_647).default(1),
    accidentals: z
      .enum(['sharp', 'flat', 'both'], { error: 'Choose sharp, flat or both.' })
      .default('sharp'),
    octaves: Flag,
    hand: z.enum(['right', 'left'], { error: 'Choose right or left.' }).default('right'),
    title: Title,
  })
  .superRefine((query, ctx) => {
    if (query.to <= query.from) {
      ctx.addIssue({
        code: 'custom',
        path: ['to'],
        message: 'The last fret must be above the first.',
      })
    } else if (query.to - query.from > 24) {
      ctx.addIssue({ code: 'custom', path: ['to'], message: 'Show at most 24 frets on one neck.' })
    }
    if (!reachable(query.tuning, query.to)) {
      ctx.addIssue({ code: 'custom', path: ['to'], message: 'That fret goes above MIDI note 127.' })
    }
    const cells = query.tuning.length * (query.to - query.from + 1)
    if (query.quiz > cells) {
      ctx.addIssue({
        code: 'custom',
        path: ['quiz'],
        message: `This neck has only ${cells} places.`,
      })
    }
  })
export type NeckQuery = z.infer<typeof NeckQuerySchema>

const Instrument = {
  tuning: Tuning,
  frets: Frets,
  paper: Paper,
  title: Title,
}

function fretsReachable(query: { tuning: number[]; frets: number }, ctx: z.RefinementCtx) {
  if (!reachable(query.tuning, query.frets)) {
    ctx.addIssue({
      code: 'custom',
      path: ['frets'],
      message: 'The top fret goes above MIDI note 127.',
    })
  }
}

// A fret region (Range Runs) or position (Chord Tones) must start before it ends, on the neck.
function regionChecks(
  query: { lowFret: number; highFret: number; frets: number },
  ctx: z.RefinementCtx,
  word: 'region' | 'position',
) {
  const issue = (message: string) => ctx.addIssue({ code: 'custom', path: ['highFret'], message })
  if (query.highFret < query.lowFret) issue(`The ${word} ends before it starts.`)
  if (query.highFret > query.frets) issue(`The ${word} goes past the last fret.`)
}

export const CycleQuerySchema = z
  .object({
    ...Instrument,
    low: Pitch.optional(),
    high: Pitch.optional(),
    scale: Scale,
    cycle: z
      .enum(['fourths', 'fifths', 'chromatic', 'whole-tone', 'custom'], {
        error: 'Choose fourths, fifths, chromatic, whole-tone or custom.',
      })
      .default('fourths'),
    tonics: z.string().max(200).optional(),
    start: Tonic.optional(),
  })
  .superRefine((query, ctx) => {
    fretsReachable(query, ctx)
    if (query.low !== undefined && query.high !== undefined && query.low >= query.high) {
      ctx.addIssue({
        code: 'custom',
        path: ['high'],
        message: 'The high note must be above the low note.',
      })
    }
    if (query.cycle === 'custom' && !query.tonics?.trim()) {
      ctx.addIssue({ code: 'custom', path: ['tonics'], message: 'List the keys, e.g. C,F,Bb.' })
    }
  })
export type CycleQuery = z.infer<typeof CycleQuerySchema>

export const ScatterQuerySchema = z
  .object({
    ...Instrument,
    tonic: Tonic.default('C'),
    scale: Scale,
    low: Pitch.optional(),
    high: Pitch.optional(),
    minDisplaced: whole(0, 12).default(2),
    maxLeap: whole(1, 48).optional(),
    seed: whole(0, 999_999).optional(),
    count: whole(1, 12).default(6),
    answers: Flag,
  })
  .superRefine(fretsReachable)
export type ScatterQuery = z.infer<typeof ScatterQuerySchema>

export const RunsQuerySchema = z
  .object({
    ...Instrument,
    tonic: Tonic.default('C'),
    scale: Scale,
    lowFret: whole(0, 30).default(2),
    highFret: whole(0, 30).default(5),
    maxPerString: whole(1, 8).default(4),
    handSpan: whole(2, 8).default(4),
    count: whole(1, 12).default(6),
  })
  .superRefine((query, ctx) => {
    fretsReachable(query, ctx)
    regionChecks(query, ctx, 'region')
  })
export type RunsQuery = z.infer<typeof RunsQuerySchema>

export const ChordsQuerySchema = z
  .object({
    ...Instrument,
    progression: z
      .enum(['two-five-one', 'blues', 'custom'], {
        error: 'Choose two-five-one, blues or custom.',
      })
      .default('two-five-one'),
    quality: z.enum(['major', 'minor'], { error: 'Choose major or minor.' }).default('major'),
    cycle: z.enum(['fourths', 'fifths'], { error: 'Choose fourths or fifths.' }).default('fourths'),
    start: Tonic.default('C'),
    /** The own list: chord symbols separated by spaces, commas or bar lines. */
    chords: z.string().max(200, 'Use at most 200 characters.').default(''),
    size: z
      .enum(['triad', 'sixth', 'seventh'], { error: 'Choose triad, sixth or seventh.' })
      .default('seventh'),
    inversion: z
      .enum(['root', 'first', 'second', 'third', 'rotate'], {
        error: 'Choose root, first, second, third or rotate.',
      })
      .default('root'),
    lowFret: whole(0, 30).default(2),
    highFret: whole(0, 30).default(6),
    /** How many chords of the progression the sheet lists, from its first. */
    count: whole(1, 48).default(12),
    answers: Flag,
  })
  .superRefine((query, ctx) => {
    fretsReachable(query, ctx)
    regionChecks(query, ctx, 'position')
    if (query.progression === 'custom' && !query.chords.trim()) {
      ctx.addIssue({
        code: 'custom',
        path: ['chords'],
        message: 'List the chords, e.g. Am7 D7 Gmaj7.',
      })
    }
  })
export type ChordsQuery = z.infer<typeof ChordsQuerySchema>

/** Every worksheet kind and the query it takes (the client builds its links from these). */
export const WORKSHEET_KINDS = ['neck', 'cycle', 'scatter', 'runs', 'chords'] as const
export type WorksheetKind = (typeof WORKSHEET_KINDS)[number]
