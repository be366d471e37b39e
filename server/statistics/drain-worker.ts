// The drain's worker thread (run by piscina): each task is one drain on the thread's own pool, so
// rolling answers up (SQL waits and the review-card arithmetic) never holds the request event loop.
import { workerData } from 'node:worker_threads'
import { createDb, type Db } from '../lib/db'
import { drainOnce } from './rollup-drain'

export interface DrainWorkerData {
  databaseUrl: string
}

let db: Db | undefined

/** One drain (at most DRAIN_LIMIT answers); resolves to how many answers it took. */
export default function drainTask(): Promise<number> {
  db ??= createDb((workerData as DrainWorkerData).databaseUrl)
  return drainOnce(db)
}
