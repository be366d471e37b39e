// Runs the fretboard benchmark (tests/bench/fretboard.bench.ts) in Vitest's jsdom client project,
// where .vue files compile as in the app: npm run bench:fretboard. Prints figures and the ratio.
import { startVitest } from 'vitest/node'

const vitest = await startVitest('benchmark', ['tests/bench/fretboard.bench.ts'], {
  project: 'client',
  run: true,
  watch: false,
})
await vitest.close()
