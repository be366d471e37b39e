// The statistics queue of one app process: readers settle their players' waiting answers before they
// read; the background drain (the server process only) rolls up everyone's answers within moments.
import type { Logger } from 'pino'
import type { StatisticsQueue } from '../context'
import type { Db } from '../lib/db'
import { DRAIN_LIMIT, drainOnce } from './rollup-drain'
import { pendingCount } from './rollup-queue-repository'

/** After new answers, the drain waits this long so that a few requests' answers go in one drain. */
const NUDGE_MS = 50
/** Without news it still looks this often (answers written by other processes, left by a crash). */
const POLL_MS = 1000

export interface StatisticsWorker extends StatisticsQueue {
  /** Starts the background drain (drains at once, then on nudges and every POLL_MS). */
  start(): void
  /** Stops it; resolves when a drain under way has finished. */
  stop(): Promise<void>
}

/** Drains in the background: soon after a nudge, else every POLL_MS; one drain at a time. */
class BackgroundDrain {
  private timer: NodeJS.Timeout | undefined
  private due = Infinity
  private running: Promise<void> | undefined
  private nudged = false
  private stopped = true

  constructor(
    private readonly db: Db,
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
      while (!this.stopped && (await drainOnce(this.db)) === DRAIN_LIMIT);
    } catch (err) {
      this.logger.error({ err }, 'statistics drain failed; the answers stay queued')
    }
  }
}

/** The statistics queue on a database; `start()` adds the background drain (the server does). */
export function createStatistics(db: Db, logger: Logger): StatisticsWorker {
  const background = new BackgroundDrain(db, logger)
  return {
    async settle(userIds) {
      if (!userIds.length || (await pendingCount(db, userIds)) === 0) return 0
      try {
        while ((await drainOnce(db, { userIds })) === DRAIN_LIMIT);
      } catch (err) {
        logger.error({ err }, 'statistics drain failed; the answers stay queued')
      }
      return pendingCount(db, userIds)
    },
    nudge: () => background.nudge(),
    start: () => background.start(),
    stop: () => background.stop(),
  }
}
