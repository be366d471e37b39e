// When the background drain runs: soon after a nudge, else every POLL_MS, one drain at a time, again
// while a drain comes back full. The drains themselves run on a worker thread (drain-worker.ts).
import type { Logger } from 'pino'
import { DRAIN_LIMIT } from './rollup-drain'

/** After new answers, the drain waits this long so that a few requests' answers go in one drain. */
const NUDGE_MS = 50
/** Without news it still looks this often (answers written by other processes, left by a crash). */
const POLL_MS = 1000

/** Drains in the background: soon after a nudge, else every POLL_MS; one drain at a time. */
export class BackgroundDrain {
  private timer: NodeJS.Timeout | undefined
  private due = Infinity
  private running: Promise<void> | undefined
  private nudged = false
  private stopped = true

  constructor(
    private readonly drain: () => Promise<number>,
    private readonly logger: Logger,
  ) {}

  start() {
    this.stopped = false
    this.schedule(0)
  }

  async stop() {
    this.stopped = true
    clearTimeout(this.timer)
    await this.running
  }

  nudge() {
    if (this.running) this.nudged = true
    else this.schedule(NUDGE_MS)
  }

  private schedule(ms: number) {
    if (this.stopped || Date.now() + ms >= this.due) return
    clearTimeout(this.timer)
    this.due = Date.now() + ms
    this.timer = setTimeout(() => void this.run(), ms).unref()
  }

  private async run() {
    this.due = Infinity
    this.nudged = false
    this.running = this.drainWhileFull()
    await this.running
    this.running = undefined
    this.schedule(this.nudged ? NUDGE_MS : POLL_MS)
  }

  private async drainWhileFull() {
    try {
      while (!this.stopped && (await this.drain()) === DRAIN_LIMIT);
    } catch (err) {
      this.logger.error({ err }, 'statistics drain failed; the answers stay queued')
    }
  }
}
