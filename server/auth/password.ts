// Password hashing with bcryptjs (cost from configuration, at least 12) in a pool of worker
// threads, so hashing never stalls the requests the event loop is serving.
import { availableParallelism } from 'node:os'
import { Piscina } from 'piscina'
import { AppError } from '../lib/errors'
import type { PasswordTask } from './password-worker'

// One core stays with the event loop (and PostgreSQL); at most four hashing threads.
const THREADS = Math.max(1, Math.min(4, availableParallelism() - 1))
// Beyond this many waiting hashes the server answers 503 instead of queueing without end.
const MAX_QUEUE = 64

let pool: Piscina<PasswordTask, string | boolean> | null = null
let inFlight = 0

function workers() {
  pool ??= new Piscina({
    // The worker is TypeScript: it runs under the same tsx loader (execArgv) as the server.
    filename: new URL('./password-worker.ts', import.meta.url).href,
    minThreads: 0,
    maxThreads: THREADS,
    idleTimeout: 60_000,
    maxQueue: MAX_QUEUE,
  })
  return pool
}

async function run<R extends string | boolean>(task: PasswordTask): Promise<R> {
  inFlight += 1
  try {
    return (await workers().run(task)) as R
  } catch (error) {
    if (/queue is at limit/i.test(String((error as Error).message))) {
      throw new AppError(
        'busy',
        'The server is busy. Please try again in a moment.',
        503,
        undefined,
        {
          'Retry-After': '5',
        },
      )
    }
    throw error
  } finally {
    inFlight -= 1
  }
}

export const hashPassword = (password: string, cost: number) =>
  run<string>({ op: 'hash', password, cost })
export const verifyPassword = (password: string, hash: string) =>
  run<boolean>({ op: 'verify', password, hash })

/** Hashing and verifying tasks submitted and not finished yet (queued or running). */
export const passwordTasksInFlight = () => inFlight

/** Stops the worker threads (server shutdown). */
export async function closePasswordPool() {
  const closing = pool
  pool = null
  await closing?.destroy()
}

// Compared against when the e-mail is unknown, so sign-in takes as long either way.
export const UNKNOWN_USER_HASH = '$2b$12$lT4e6T5XL8f7xzMHNIUEX.43jCx2m6mIYGoKIEwidEp1crzwRcuy6'
