// Benchmark of listening (npm run bench:pitch): every bass note B0–G4 and guitar note E2–E6 as a
// synthetic plucked tone, a Karplus–Strong string and the app's own sampled note, clean and with
// noise at 20 dB SNR plus 50/60 Hz hum, note sequences with repeated notes and noise-only takes.
// The live frame path (128-sample render quanta, gate from a 2 s quiet-room calibration) and
// transcribe() are scored; so is a naive baseline (FFT peak picking) on the same frames in the
// same run. Prints per octave: median/p95 ms from onset to verdict, wrong, octave, missed notes.
import {
  createNoteDetector,
  noiseGate,
  transcribe,
  type DetectorEvent,
  type FrameAnalyser,
} from '../../src/listen'
import { frequencyLimits, resolveRange } from '../../src/listen/pitch-range'
import { noiseOnly, sequences, singleNotes, type Take } from './pitch-cases'
import { fftPeakAnalyser } from './pitch-baseline'
import { createScore, printScores, type Heard, type Score } from './pitch-score'

const QUANTUM = 128

function calibratedGate(take: Take): number {
  const detector = createNoteDetector({
    sampleRate: take.sampleRate,
    lowest: take.instrument.lowest,
  })
  const peaks = detector.push(take.room).flatMap((e) => (e.type === 'level' ? [e.peakDb] : []))
  return noiseGate(peaks).gateDb
}

/** The live path: render quanta of 128 samples into the streaming detector. */
function listenLive(
  take: Take,
  gateDb: number,
  analyser?: (sampleRate: number) => FrameAnalyser,
): Heard[] {
  const { lowest, highest } = take.instrument
  const detector = createNoteDetector({
    sampleRate: take.sampleRate,
    lowest,
    highest,
    gateDb,
    analyser: analyser?.(take.sampleRate),
  })
  const events: DetectorEvent[] = []
  const input = take.samples
  for (let at = 0; at < input.length + detector.window; at += QUANTUM) {
    const quantum = at < input.length ? input.subarray(at, at + QUANTUM) : new Float32Array(QUANTUM)
    events.push(...detector.push(quantum))
  }
  return events.flatMap((e) => (e.type === 'note' ? [e] : []))
}

function baseline(take: Take) {
  return (sampleRate: number) => {
    const range = resolveRange(take.instrument)
    return fftPeakAnalyser(sampleRate, frequencyLimits(range))
  }
}

function allTakes() {
  return (async function* () {
    yield* singleNotes()
    yield* sequences()
    yield* noiseOnly()
  })()
}

async function main() {
  const scores = { live: createScore(), transcribe: createScore(), baseline: createScore() }
  const cpu = { live: 0, baseline: 0, audioS: 0 }
  const timed = <T>(key: 'live' | 'baseline', work: () => T): T => {
    const start = performance.now()
    const result = work()
    cpu[key] += performance.now() - start
    return result
  }
  let takes = 0
  let same = 0
  const started = performance.now()
  for await (const take of allTakes()) {
    const gateDb = calibratedGate(take)
    const live = timed('live', () => listenLive(take, gateDb))
    const offline = transcribe(take.samples, take.sampleRate, take.instrument)
    scores.live.add(take, live)
    scores.transcribe.add(
      take,
      offline.map((n) => ({ ...n, verdictMs: NaN })),
    )
    scores.baseline.add(
      take,
      timed('baseline', () => listenLive(take, gateDb, baseline(take))),
    )
    cpu.audioS += take.samples.length / take.sampleRate
    takes += 1
    if (offline.map((n) => n.pitch).join() === live.map((n) => n.pitch).join()) same += 1
  }
  const seconds = ((performance.now() - started) / 1000).toFixed(0)
  const perSecond = (ms: number) => (ms / cpu.audioS).toFixed(1)
  printScores(scores as Record<string, Score>)
  console.log(
    `\n${takes} takes (${cpu.audioS.toFixed(0)} s of audio) in ${seconds} s; transcribe() heard the same pitches as the live path in ${same} of them`,
  )
  console.log(
    `CPU per second of audio: live path ${perSecond(cpu.live)} ms, baseline ${perSecond(cpu.baseline)} ms (wall clock on this machine, under its load)`,
  )
  console.log(scores.live.summaryLine())
}

await main()
