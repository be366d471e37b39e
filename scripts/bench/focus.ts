// Focus benchmark (npm run bench:focus): simulated learners (learner-model.ts) practise until every
// place is recalled with probability ≥ 0.95, with questions chosen by the production focus selector,
// by uniform random choice and by a Leitner-box scheduler — same learner seeds for all three.
// Prints questions needed (median over learners) per board; the last line is the median over every
// learner of the paired ratios. Asserts nothing.
import { createRandom } from '../../src/theory'
import { makeBoard, recallProbability, answer, type Place } from './learner-model'
import { adaptive, leitner, uniform, type Scheduler } from './schedulers'

const LEARNERS = Number(process.env.FOCUS_LEARNERS ?? 60)
const TARGET = 0.95
const SESSION_QUESTIONS = 20
const SESSION_HOURS = [9, 13, 19] // three sessions a day
const QUESTION_MS = 8000
const MAX_QUESTIONS = 200_000
const HOUR_MS = 3600 * 1000
const START = Date.parse('2026-01-05T00:00:00Z')

const BOARDS = [
  { name: '4-string bass, frets 0–12', tuning: [28, 33, 38, 43], frets: 13, weak: 4 },
  { name: '6-string guitar, frets 0–22', tuning: [40, 45, 50, 55, 59, 64], frets: 23, weak: 8 },
]
const STRATEGIES: Record<string, (places: Place[], seed: number) => Scheduler> = {
  adaptive,
  uniform,
  leitner: (places) => leitner(places),
}

const mastered = (places: Place[], now: number) =>
  places.every((p) => recallProbability(p, now) >= TARGET)

/** Questions one learner needs with one strategy (capped at MAX_QUESTIONS). */
function questionsToMastery(
  board: (typeof BOARDS)[number],
  seed: number,
  strategy: string,
): number {
  const places = makeBoard(board.tuning, board.frets, board.weak, createRandom(seed))
  const learner = createRandom(seed * 7919 + 1)
  const scheduler = STRATEGIES[strategy]!(places, seed)
  let asked = 0
  for (let day = 0; asked < MAX_QUESTIONS; day++) {
    for (const hour of SESSION_HOURS) {
      let now = START + day * 24 * HOUR_MS + hour * HOUR_MS
      if (asked > 0 && mastered(places, now)) return asked
      const answers = scheduler.next(SESSION_QUESTIONS, now).map((index) => {
        now += QUESTION_MS
        return { index, at: now, ...answer(places[index]!, now, learner) }
      })
      scheduler.record(answers)
      asked += answers.length
    }
  }
  return MAX_QUESTIONS
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b)
  const mid = s.length / 2
  return s.length % 2 ? s[Math.floor(mid)]! : (s[mid - 1]! + s[mid]!) / 2
}

const pairedAdaptiveOverUniform: number[] = []
const pairedAdaptiveOverLeitner: number[] = []
console.log(
  `focus benchmark: ${LEARNERS} simulated learners per board, target p ≥ ${TARGET} for every place`,
)
for (const board of BOARDS) {
  const started = performance.now()
  const counts: Record<string, number[]> = { adaptive: [], uniform: [], leitner: [] }
  for (let seed = 1; seed <= LEARNERS; seed++) {
    for (const strategy of Object.keys(STRATEGIES))
      counts[strategy]!.push(questionsToMastery(board, seed, strategy))
    pairedAdaptiveOverUniform.push(counts.adaptive!.at(-1)! / counts.uniform!.at(-1)!)
    pairedAdaptiveOverLeitner.push(counts.adaptive!.at(-1)! / counts.leitner!.at(-1)!)
  }
  const capped = Object.entries(counts)
    .map(([k, v]) => `${k} ${v.filter((x) => x >= MAX_QUESTIONS).length}`)
    .join(', ')
  console.log(
    `\n${board.name} (${board.tuning.length * board.frets} places, ${board.weak} weak), ${((performance.now() - started) / 1000).toFixed(1)} s`,
  )
  for (const [strategy, values] of Object.entries(counts)) {
    console.log(
      `  ${strategy.padEnd(9)} median ${median(values)} questions (min ${Math.min(...values)}, max ${Math.max(...values)})`,
    )
  }
  console.log(`  learners that hit the ${MAX_QUESTIONS}-question cap: ${capped}`)
}
const ratio = (xs: number[]) => median(xs).toFixed(2)
console.log(
  `\nfocus: adaptive/uniform=${ratio(pairedAdaptiveOverUniform)} adaptive/leitner=${ratio(pairedAdaptiveOverLeitner)}`,
)
