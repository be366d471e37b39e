// The statistics queue of one app process: readers settle their players' waiting answers before they
// read; the background drain (the server process only) rolls up everyone's answers within moments,
// on a worker thread (drain-worker.ts) so its work never holds up a request.
import { Piscina } from 'piscina'
import type { Logger } from 'pino'
import type { StatisticsQueue } from '../context'
import type { Db } from '../lib/db'
import { BackgroundDrain } from './background-drain'
import type { DrainWorkerData } from './drain-worker'
import { DRAIN_LIMIT, drainOnce } from './rollup-drain'
import { pendingCount } from './rollup-queue-repository'

export interface StatisticsWorker extends StatisticsQueue {
  /** Starts the background drain (drains at once, then on nudges and every second). */
  start(worker: DrainWorkerData): void
  /** Stops it; resolves when a drain under way has finished. */
  stop(): Promise<void>
}

/** The background drain, each drain on one worker thread (TypeScript under the server's tsx loader). */
function backgroundDrain(data: DrainWorkerData, logger: Logger) {
  const pool = new Piscina<void, number>({
    filename: new URL('./drain-worker.ts', import.meta.url).href,
    minThreads: 1,
    maxThreads: 1,
    idleTimeout: Infinity,
    workerData: data,
  })
  const background = new BackgroundDrain(() => pool.run(), logger)
  return {
    background,
    async stop() {
      await background.stop()
      await pool.destroy()
    },
  }
}

/** The statistics queue on a database; `start()` adds the background drain (the server does). */
export function createStatistics(db: Db, logger: Logger): StatisticsWorker {
  let drain: ReturnType<typeof backgroundDrain> | undefined
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
    nudge: () => drain?.background.nudge(),
    start(data) {
      drain ??= backgroundDrain(data, logger)
      drain.background.start()
    },
    stop: async () => drain?.stop(),
  }
}
