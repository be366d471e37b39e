// The Tone.js PitchPlayer: rendered FluidR3Mono samples through Tone.Sampler (repitched from the
// nearest sample, A4 = the player's reference), a synthesized pluck with exact pitch when samples
// cannot load or a note is far from every sample, and a metronome click on Tone.Transport.
// Loaded only by dynamic import (see index.ts), so pages without sound never download Tone.
import * as Tone from 'tone'
import type { PitchPlayer } from './pitch-player'
import {
  MAX_REPITCH,
  nearestSample,
  ONSET_PREROLL_S,
  onsetIndex,
  playbackFrequency,
  SAMPLE_BASE_URL,
  SAMPLE_SETS,
  sampleUrls,
  voiceFor,
  type SampleVoice,
} from './sample-map'

// The pluck used when samples are missing: harmonics make B0 audible on small speakers.
function createSynthVoice(output: Tone.ToneAudioNode) {
  return new Tone.PolySynth(Tone.Synth, {
    oscillator: { type: 'custom', partials: [1, 0.9, 0.65, 0.5, 0.35, 0.25, 0.16, 0.1] },
    envelope: { attack: 0.004, decay: 0.5, sustain: 0.12, release: 0.35 },
    volume: -10,
  }).connect(output)
}

function createClick(output: Tone.ToneAudioNode) {
  return new Tone.Synth({
    oscillator: { type: 'triangle' },
    envelope: { attack: 0.001, decay: 0.04, sustain: 0, release: 0.02 },
    volume: -6,
  }).connect(output)
}

/** The sample from just before its onset (see onsetIndex): no encoder silence in front of it. */
function trimmed(buffer: Tone.ToneAudioBuffer): Tone.ToneAudioBuffer {
  const onsetS = onsetIndex(buffer.getChannelData(0)) / buffer.sampleRate
  const startS = Math.max(0, onsetS - ONSET_PREROLL_S)
  return startS > 0 ? buffer.slice(startS) : buffer
}

function loadSampler(voice: SampleVoice, output: Tone.ToneAudioNode): Promise<Tone.Sampler> {
  const urls = sampleUrls(voice)
  return new Promise<Tone.ToneAudioBuffers>((resolve, reject) => {
    const buffers: Tone.ToneAudioBuffers = new Tone.ToneAudioBuffers({
      urls,
      baseUrl: `${SAMPLE_BASE_URL}/${voice}/`,
      onload: () => resolve(buffers),
      onerror: (error) => reject(error),
    })
  }).then((buffers) => {
    const notes = Object.fromEntries(
      Object.keys(urls).map((pitch) => [pitch, trimmed(buffers.get(pitch))]),
    )
    return new Tone.Sampler({ urls: notes, release: 0.25 }).connect(output)
  })
}

/** The metronome: a click each beat, the first of every four higher. */
function createMetronome(output: Tone.ToneAudioNode) {
  const level = new Tone.Volume(0).connect(output)
  const click = createClick(level)
  let clickId: number | null = null
  const stop = () => {
    const transport = Tone.getTransport()
    if (clickId !== null) transport.clear(clickId)
    clickId = null
    transport.stop()
  }
  const start = (bpm: number) => {
    const transport = Tone.getTransport()
    if (clickId !== null) transport.clear(clickId)
    transport.bpm.value = bpm
    let beat = 0
    clickId = transport.scheduleRepeat((time) => {
      click.triggerAttackRelease(beat % 4 === 0 ? 'A5' : 'E5', 0.03, time)
      beat += 1
    }, '4n')
    transport.start()
  }
  const setVolume = (volume: number) => {
    const gain = Math.min(1, Math.max(0, volume))
    level.mute = gain === 0
    if (gain > 0) level.volume.value = Tone.gainToDb(gain)
  }
  return { start, stop, setVolume }
}

/** Each voice's sampler, loaded once on first use (null when its samples cannot be loaded). */
function samplerCache(output: Tone.ToneAudioNode) {
  const samplers = new Map<SampleVoice, Promise<Tone.Sampler | null>>()
  return (which: SampleVoice) => {
    if (!samplers.has(which))
      samplers.set(
        which,
        loadSampler(which, output).catch(() => null),
      )
    return samplers.get(which)!
  }
}

export function createTonePlayer(): PitchPlayer {
  // Limiter last: however the volume is set, the output never clips.
  const limiter = new Tone.Limiter(-1).toDestination()
  const master = new Tone.Volume(Tone.gainToDb(0.6)).connect(limiter)
  const synth = createSynthVoice(master)
  const metronome = createMetronome(master)
  const sampler = samplerCache(master)
  let voice: SampleVoice = 'bass'
  let referenceHz = 440
  let state: PitchPlayer['voice'] = 'silent'

  async function start() {
    await Tone.start()
    state = (await sampler(voice)) ? 'samples' : 'synth'
  }

  function play(
    pitch: number,
    options: { durationS?: number; delayS?: number; velocity?: number } = {},
  ) {
    const { durationS = 1.2, delayS = 0, velocity = 0.85 } = options
    const when = Tone.now() + delayS
    const frequency = playbackFrequency(pitch, referenceHz)
    const near = Math.abs(nearestSample(pitch, referenceHz, SAMPLE_SETS[voice].pitches).semitones)
    void sampler(voice).then((loaded) => {
      if (loaded && near <= MAX_REPITCH)
        loaded.triggerAttackRelease(frequency, durationS, when, velocity)
      else synth.triggerAttackRelease(frequency, durationS, Math.max(when, Tone.now()), velocity)
    })
  }

  return {
    start,
    play,
    playSequence: (pitches, bpm) =>
      pitches.forEach((pitch, i) =>
        play(pitch, { delayS: (60 / bpm) * i, durationS: (60 / bpm) * 0.95 }),
      ),
    startClick: metronome.start,
    stopClick: metronome.stop,
    setClickVolume: metronome.setVolume,
    setVolume: (volume) => {
      const gain = Math.min(1, Math.max(0, volume))
      master.mute = gain === 0
      if (gain > 0) master.volume.rampTo(Tone.gainToDb(gain), 0.05)
    },
    setReferenceHz: (hz) => {
      referenceHz = hz
    },
    setTuning: (tuning) => {
      if (tuning.length === 0) return
      voice = voiceFor(tuning)
      void sampler(voice)
    },
    get voice() {
      return state
    },
  }
}
