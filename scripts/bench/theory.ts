// Benchmark of the theory core (npm run bench:theory): ms per call, median of many batches, each
// workload beside a naive baseline run in the same process and printed as a ratio. Asserts nothing.
import { Note, Scale } from 'tonal'
import {
  countFingerings,
  cycleNotes,
  cycleTonics,
  fingeringsOf,
  keyCycleInWindow,
  pitchName,
  positionsOf,
  rangeRun,
  SCALE_TYPES,
  type Fingering,
  type FingeringOptions,
  type Position,
} from '../../src/theory'

const EIGHT_STRING = [30, 35, 40, 45, 50, 55, 59, 64] // F#1 B1 E2 A2 D3 G3 B3 E4
const BASS = [28, 33, 38, 43] // E1 A1 D2 G2
const GUITAR = [40, 45, 50, 55, 59, 64] // E2 A2 D3 G3 B3 E4
const TWO_OCTAVES_G = [43, 45, 47, 48, 50, 52, 54, 55, 57, 59, 60, 62, 64, 66, 67] // G2 major to G4
const FOURTHS = cycleTonics('fourths')
const WINDOW = { low: 36, high: 48 } // C2–C3

interface Timing {
  ours: number
  naive: number
}

// Calls per batch so one batch lasts ≥ minMs; the doubling doubles as a JIT warm-up.
function batchSize(task: () => unknown, minMs = 5): number {
  let calls = 1
  for (let start = performance.now(); performance.now() - start < minMs; calls *= 2) {
    for (let i = 0; i < calls; i += 1) task()
  }
  return calls
}

function msPerCall(task: () => unknown, calls: number): number {
  const start = performance.now()
  for (let i = 0; i < calls; i += 1) task()
  return (performance.now() - start) / calls
}

const median = (samples: number[]) => [...samples].sort((a, b) => a - b)[samples.length >> 1] ?? NaN

/** Median ms per call of ours and the naive baseline, batches interleaved so both see the same machine. */
function compare(ours: () => unknown, naive: () => unknown, batches = 21, minMs = 5): Timing {
  const sizes = [batchSize(ours, minMs), batchSize(naive, minMs)] as const
  const samples = Array.from({ length: batches }, () => [
    msPerCall(ours, sizes[0]),
    msPerCall(naive, sizes[1]),
  ])
  return {
    ours: median(samples.map(([mine = NaN]) => mine)),
    naive: median(samples.map(([, base = NaN]) => base)),
  }
}

function naivePositionsOf(tuning: number[], frets: number, pitch: number): Position[] {
  const found: Position[] = []
  for (let string = 0; string < tuning.length; string += 1) {
    for (let fret = 0; fret <= frets; fret += 1) {
      if ((tuning[string] ?? 0) + fret === pitch) found.push({ string, fret })
    }
  }
  return found
}

// The window cycle done the obvious way: tonal on every call, scanning every MIDI note.
function naiveKeyCycle(low: number, high: number, tonics: string[], scale: string): number[][] {
  let last: number | undefined
  return tonics.map((tonic) => {
    const chromas = Scale.get(`${tonic} ${scale}`).notes.map((name) => Note.get(name).chroma)
    const roots = [...Array(128).keys()].filter(
      (m) => m >= low && m <= high && m % 12 === chromas[0],
    )
    const from = last
    let pitch =
      from === undefined
        ? roots[0]!
        : roots.reduce((a, b) => (Math.abs(b - from) < Math.abs(a - from) ? b : a))
    const pitches = [pitch]
    for (let degree = 1; degree <= chromas.length; degree += 1) {
      const chroma = chromas[degree % chromas.length]
      pitch = [...Array(128).keys()].find((m) => m > pitch && m % 12 === chroma)!
      while (pitch > high) pitch -= 12
      pitches.push(pitch)
    }
    last = pitches.at(-1)
    return pitches
  })
}

// Fingerings by brute force: every string choice per note that never goes back (the full 6^15
// product of all choices is out of reach), then each checked against the rules and sorted.
function naiveFingerings(
  tuning: number[],
  frets: number,
  run: number[],
  max = 4,
  span = 4,
): Fingering[] {
  const found: Fingering[] = []
  const choose = (strings: number[]): void => {
    if (strings.length === run.length) {
      const fingering = checkChoice(tuning, frets, run, strings, max, span)
      if (fingering) found.push(fingering)
      return
    }
    for (let string = strings.at(-1) ?? 0; string < tuning.length; string += 1)
      choose([...strings, string])
  }
  choose([])
  return found.sort((a, b) => a.shifts - b.shifts || a.pattern.localeCompare(b.pattern))
}

function checkChoice(
  tuning: number[],
  frets: number,
  run: number[],
  strings: number[],
  max: number,
  span: number,
): Fingering | undefined {
  const positions = strings.map((string, i) => ({ string, fret: run[i]! - tuning[string]! }))
  if (positions.some(({ fret }) => fret < 0 || fret > frets)) return undefined
  const counts = new Map<number, number>()
  strings.forEach((string) => counts.set(string, (counts.get(string) ?? 0) + 1))
  const used = [...counts.keys()]
  if (used.some((string, i) => i > 0 && string !== used[i - 1]! + 1)) return undefined
  if ([...counts.values()].some((count) => count > max)) return undefined
  let shifts = 0
  let window: number[] = []
  for (const { fret } of positions.filter((position) => position.fret > 0)) {
    window = [...window, fret]
    if (Math.max(...window) - Math.min(...window) >= span) [shifts, window] = [shifts + 1, [fret]]
  }
  return { positions, pattern: [...counts.values()].join('-'), shifts }
}

// Fingerings in a hand position by brute force: every string choice that never goes back, each
// checked for the widened region and the rules, the hand simulated note by note, then sorted.
function naiveBoxFingerings(options: Required<Omit<FingeringOptions, 'handSpan'>>): Fingering[] {
  const found: Fingering[] = []
  const choose = (strings: number[]): void => {
    if (strings.length === options.run.length) {
      const fingering = checkBoxChoice(options, strings)
      if (fingering) found.push(fingering)
      return
    }
    for (let string = strings.at(-1) ?? 0; string < options.tuning.length; string += 1)
      choose([...strings, string])
  }
  choose([])
  return found.sort(
    (a, b) =>
      a.shifts - b.shifts ||
      (a.stretches ?? 0) - (b.stretches ?? 0) ||
      a.pattern.localeCompare(b.pattern),
  )
}

function checkBoxChoice(
  options: Required<Omit<FingeringOptions, 'handSpan'>>,
  strings: number[],
): Fingering | undefined {
  const { tuning, run, lowFret, highFret, shifts, frets } = options
  const positions = strings.map((string, i) => ({ string, fret: run[i]! - tuning[string]! }))
  const [low, high] = [Math.max(0, lowFret - shifts), Math.min(frets, highFret + shifts)]
  if (positions.some(({ fret }) => fret < low || fret > high)) return undefined
  const counts = new Map<number, number>()
  strings.forEach((string) => counts.set(string, (counts.get(string) ?? 0) + 1))
  const used = [...counts.keys()]
  if (used.some((string, i) => i > 0 && string !== used[i - 1]! + 1)) return undefined
  if ([...counts.values()].some((count) => count > options.maxPerString)) return undefined
  const cover = options.handSystem === 'three-fret' ? 3 : 4
  let [hand, moved, stretched] = [Math.max(1, lowFret), 0, 0]
  for (const { fret } of positions) {
    if (fret === 0 || (fret >= hand && fret < hand + cover)) continue
    if (fret === hand - 1 || fret === hand + cover) stretched += 1
    else [hand, moved] = [fret > hand ? fret - cover + 1 : fret, moved + 1]
  }
  if (moved > shifts) return undefined
  const pattern = [...counts.values()].join('-')
  return { positions, pattern, shifts: moved, stretches: stretched }
}

function row(label: string, { ours, naive }: Timing, target?: number): void {
  const verdict =
    target === undefined ? '' : `   target < ${target} ms: ${ours < target ? 'met' : 'MISSED'}`
  const figures = `${ours.toPrecision(3).padStart(10)} ms | naive ${naive.toPrecision(3).padStart(10)} ms`
  console.log(
    `${label.padEnd(64)} ${figures} | ratio ${(naive / ours).toFixed(1).padStart(6)}×${verdict}`,
  )
}

function benchPositions(): void {
  const pitches = Array.from({ length: 64 + 24 - 30 + 1 }, (_, k) => 30 + k)
  const sweep = compare(
    () => pitches.map((pitch) => positionsOf(EIGHT_STRING, 24, pitch)),
    () => pitches.map((pitch) => naivePositionsOf(EIGHT_STRING, 24, pitch)),
  )
  row(`positionsOf, all ${pitches.length} pitches of 8-string 24-fret (per sweep)`, sweep)
  row('positionsOf, one call (sweep ÷ pitch count)', {
    ours: sweep.ours / pitches.length,
    naive: sweep.naive / pitches.length,
  })
}

function benchWindowCycles(): void {
  const start = performance.now()
  keyCycleInWindow({ ...WINDOW, tonics: FOURTHS, scale: 'lydian' })
  console.log(
    `12-key window cycle, lydian, first call (scale cache cold): ${(performance.now() - start).toFixed(4)} ms`,
  )
  const results = SCALE_TYPES.map(({ name }) => ({
    name,
    ...compare(
      () => keyCycleInWindow({ ...WINDOW, tonics: FOURTHS, scale: name }),
      () => naiveKeyCycle(WINDOW.low, WINDOW.high, FOURTHS, name),
      15,
      2,
    ),
  }))
  const sorted = [...results].sort((a, b) => a.ours - b.ours)
  const middle = sorted[sorted.length >> 1]
  const slowest = sorted.at(-1)
  const total = (key: keyof Timing) => results.reduce((sum, result) => sum + result[key], 0)
  if (middle) row(`12-key window cycle C2–C3, median of ${results.length} scale types`, middle, 0.2)
  if (slowest) row(`12-key window cycle, slowest type (${slowest.name})`, slowest, 0.2)
  row('12-key window cycle, every scale type in turn (sum)', {
    ours: total('ours'),
    naive: total('naive'),
  })
}

function benchFingerings(): void {
  const options = { tuning: GUITAR, frets: 22, run: TWO_OCTAVES_G }
  const counts = `${fingeringsOf(options).length}; naive ${naiveFingerings(GUITAR, 22, TWO_OCTAVES_G).length}`
  const listing = compare(
    () => fingeringsOf(options),
    () => naiveFingerings(GUITAR, 22, TWO_OCTAVES_G),
    11,
  )
  row(`all fingerings, G major 2 octaves, 6 strings (${counts})`, listing, 20)
  const counting = compare(
    () => countFingerings(options),
    () => fingeringsOf(options).length,
  )
  row('countFingerings, same run (baseline: list them all and count)', counting)
  const large = {
    tuning: [23, 28, 33, 38, 43, 48, 53, 58, 63, 68], // 10 strings in fourths from B0
    frets: 24,
    run: Array.from({ length: 49 }, (_, k) => 36 + k),
    maxPerString: 12,
  }
  const ms = msPerCall(
    () => countFingerings(large),
    batchSize(() => countFingerings(large)),
  )
  console.log(
    `countFingerings, 4-octave chromatic, 10 strings, ≤ 12 per string: ${countFingerings(large)} fingerings, ${ms.toFixed(4)} ms (too many to list)`,
  )
}

function benchBoxFingerings(): void {
  const cases = [
    {
      name: 'bass, G major frets 5–8, 1 shift',
      tuning: BASS,
      frets: 20,
      lowFret: 5,
      highFret: 8,
      shifts: 1,
    },
    {
      name: 'guitar, G major frets 2–6, 3 shifts',
      tuning: GUITAR,
      frets: 22,
      lowFret: 2,
      highFret: 6,
      shifts: 3,
    },
  ]
  for (const { name, ...region } of cases) {
    const run = rangeRun({ ...region, tonic: 'G', scale: 'major' })
    const options = { ...region, run, maxPerString: 4, handSystem: 'one-finger-per-fret' as const }
    const mine = fingeringsOf(options)
    const naive = naiveBoxFingerings(options)
    const outside = mine.filter((f) =>
      f.positions.some(
        (p) => p.fret < region.lowFret - region.shifts || p.fret > region.highFret + region.shifts,
      ),
    ).length
    const label = `fingerings in position, ${name} (${run.length} notes: ${mine.length}; naive ${naive.length}; outside the widened box ${outside})`
    row(
      label,
      compare(
        () => fingeringsOf(options),
        () => naiveBoxFingerings(options),
        11,
      ),
      20,
    )
  }
}

function benchCycleSessions(): void {
  const options = {
    low: 28,
    high: 47,
    tonics: FOURTHS,
    scale: 'major',
    direction: 'alternate' as const,
  }
  const whole = keyCycleInWindow(options).flatMap((key) => key.pitches)
  const sessions = (size: number) => {
    let position = undefined as Parameters<typeof cycleNotes>[1]['fromPosition']
    for (let played = 0; played < 96; played += size) {
      position = cycleNotes(options, { fromPosition: position, count: size }).nextPosition
    }
  }
  const timing = compare(
    () => sessions(8),
    () => keyCycleInWindow(options),
  )
  row('window cycle E1–B2 alternate, 12 sessions of 8 notes (baseline: one whole cycle)', timing)
  console.log(
    `  pitches played E1–B2 alternate: ${pitchName(Math.min(...whole))}–${pitchName(Math.max(...whole))}`,
  )
}

console.log('Ambitus theory core benchmark: ms per call, median of many batches.')
console.log('ratio = naive baseline ÷ theory core, both timed in this run (higher is better).\n')
benchPositions()
benchWindowCycles()
benchFingerings()
benchBoxFingerings()
benchCycleSessions()
