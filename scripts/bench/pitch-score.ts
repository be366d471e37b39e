// Scoring for npm run bench:pitch: every played note is heard right, an octave off, wrong or not
// at all; extra notes and notes heard in silence or noise count too; rows per octave.
import type { Take } from './pitch-cases'

export interface Heard {
  pitch: number
  onsetMs: number
  verdictMs: number
}

type Played = Take['played'][number]

interface Group {
  notes: number
  latencies: number[]
  wrong: number
  octave: number
  miss: number
  extra: number
}

/** An onset heard this early counts for the note (onset estimates are a few ms off). */
const EARLY_MS = 30
const E1 = 28
const B0 = 23
const G2 = 43

const groupOf = (pitch: number) => {
  const octave = Math.floor(pitch / 12) - 1
  if (octave === 2) return pitch >= G2 ? '2 (G2–B2)' : '2 (C2–F#2)'
  return `${octave}`
}

const quantile = (values: number[], q: number) => {
  if (values.length === 0) return NaN
  const sorted = [...values].sort((a, b) => a - b)
  return sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))] ?? NaN
}
const median = (values: number[]) => quantile(values, 0.5)

const emptyGroup = (): Group => ({
  notes: 0,
  latencies: [],
  wrong: 0,
  octave: 0,
  miss: 0,
  extra: 0,
})

// BENCH_DEBUG=1 prints every played note not heard exactly once at its pitch.
function debugLine(played: Played, heard: Heard[], repeated: boolean, take: Take) {
  if (!process.env.BENCH_DEBUG || (heard.length === 1 && heard[0]?.pitch === played.pitch)) return
  console.log(
    `${take.instrument.name} ${take.source} ${take.condition} ${take.label} @${played.onsetMs}: played ${played.pitch}${repeated ? ' (repeat)' : ''}, heard ${heard.map((n) => `${n.pitch}@${n.onsetMs.toFixed(0)}`).join(' ') || 'nothing'}`,
  )
}

export function createScore(): Score {
  return new Score()
}

export class Score {
  readonly groups = new Map<string, Group>()
  private readonly atNote = new Map<number, number[]>()
  private inSilence = 0
  private repeats = 0
  private repeatsHeard = 0

  add(take: Take, heard: Heard[]) {
    const first = take.played[0]?.onsetMs ?? Infinity
    this.inSilence += heard.filter((n) => n.onsetMs < first - EARLY_MS).length
    take.played.forEach((played, k) => {
      const next = take.played[k + 1]?.onsetMs ?? Infinity
      const mine = heard.filter(
        (n) => n.onsetMs >= played.onsetMs - EARLY_MS && n.onsetMs < next - EARLY_MS,
      )
      this.judge(played, mine, take.played[k - 1]?.pitch === played.pitch, take)
    })
  }

  totals() {
    const all = [...this.groups.values()]
    const sum = (key: 'notes' | 'wrong' | 'octave' | 'miss' | 'extra') =>
      all.reduce((s, g) => s + g[key], 0)
    return {
      notes: sum('notes'),
      wrong: sum('wrong') + this.inSilence,
      octave: sum('octave'),
      miss: sum('miss'),
      extra: sum('extra'),
      inSilence: this.inSilence,
      repeats: this.repeats,
      repeatsHeard: this.repeatsHeard,
    }
  }

  medianAt(pitch: number): number {
    return median(this.atNote.get(pitch) ?? [])
  }

  /** The slowest octave row's median from G2 up. */
  worstFrom(pitch: number): number {
    const rows = [...this.groups.entries()].filter(
      ([key]) => key === '2 (G2–B2)' || Number(key) > Math.floor(pitch / 12) - 1,
    )
    return Math.max(...rows.map(([, g]) => median(g.latencies)))
  }

  summaryLine(): string {
    const t = this.totals()
    const pct = (n: number) => ((100 * n) / Math.max(1, t.notes)).toFixed(2)
    const ms = (v: number) => v.toFixed(0)
    return `pitch: E1=${ms(this.medianAt(E1))} B0=${ms(this.medianAt(B0))} G2=${ms(this.worstFrom(G2))} wrong=${t.wrong} octave=${pct(t.octave)} miss=${pct(t.miss)}`
  }

  private group(pitch: number): Group {
    const key = groupOf(pitch)
    let group = this.groups.get(key)
    if (!group) this.groups.set(key, (group = emptyGroup()))
    return group
  }

  private judge(played: Played, heard: Heard[], repeated: boolean, take: Take) {
    debugLine(played, heard, repeated, take)
    const g = this.group(played.pitch)
    g.notes += 1
    if (repeated) this.repeats += 1
    heard.forEach((note, k) => {
      const off = note.pitch - played.pitch
      if (off !== 0 && off % 12 === 0) g.octave += 1
      else if (off !== 0) g.wrong += 1
      else if (k > 0) g.extra += 1
      else this.heardRight(played, note, repeated, g)
    })
    if (!heard.some((note) => note.pitch === played.pitch) && heard.length === 0) g.miss += 1
  }

  private heardRight(played: Played, note: Heard, repeated: boolean, g: Group) {
    if (repeated) this.repeatsHeard += 1
    const latency = note.verdictMs - played.onsetMs
    if (!Number.isFinite(latency)) return
    g.latencies.push(latency)
    this.atNote.set(played.pitch, [...(this.atNote.get(played.pitch) ?? []), latency])
  }
}

const cell = (value: number | string, width = 6) =>
  (typeof value === 'number' ? (Number.isFinite(value) ? value.toFixed(0) : '–') : value).padStart(
    width,
  )

export function printScores(scores: Record<string, Score>): void {
  const order = ['0', '1', '2 (C2–F#2)', '2 (G2–B2)', '3', '4', '5', '6']
  const head = (name: string) => `| ${name.padEnd(8)} med   p95 wrong   oct  miss extra `
  console.log(`octave        notes ${head('live')}${head('baseline')}`)
  for (const key of order) {
    const rows = ['live', 'baseline'].map((name) => scores[name]?.groups.get(key))
    if (!rows[0]) continue
    const line = rows.map(
      (g) =>
        `|          ${cell(median(g!.latencies))}${cell(quantile(g!.latencies, 0.95))}${cell(g!.wrong)}${cell(g!.octave)}${cell(g!.miss)}${cell(g!.extra)} `,
    )
    console.log(
      `${(key === '0' ? 'B0' : key).padEnd(13)} ${cell(rows[0].notes, 5)} ${line.join('')}`,
    )
  }
  for (const [name, score] of Object.entries(scores)) {
    const t = score.totals()
    const pct = (n: number) => `${((100 * n) / t.notes).toFixed(2)} %`
    console.log(
      `${name.padEnd(10)}: ${t.notes} notes; wrong ${t.wrong} (in silence or noise ${t.inSilence}), octave ${t.octave} (${pct(t.octave)}), missed ${t.miss} (${pct(t.miss)}), extra ${t.extra}; repeated notes heard ${t.repeatsHeard}/${t.repeats}; median at E1 ${cell(score.medianAt(E1), 0)} ms, B0 ${cell(score.medianAt(B0), 0)} ms, slowest octave from G2 ${cell(score.worstFrom(G2), 0)} ms`,
    )
  }
}
