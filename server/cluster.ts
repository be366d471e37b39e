// Process entry for npm start: WEB_CONCURRENCY app processes (node:cluster, one shared port) over the
// same PostgreSQL and object storage; one process runs server/index.ts directly. A worker that dies is
// replaced; SIGINT/SIGTERM stop every worker cleanly first.
import cluster, { type Worker } from 'node:cluster'
import { fileURLToPath } from 'node:url'

const RESTART_LIMIT = 10 // replacements per minute before the primary gives up

function workersWanted(value = process.env.WEB_CONCURRENCY) {
  const count = Number(value ?? 1)
  if (!Number.isInteger(count) || count < 1 || count > 64)
    throw new Error(`WEB_CONCURRENCY must be a whole number from 1 to 64, not "${value}"`)
  return count
}

function runPrimary(count: number) {
  cluster.setupPrimary({ exec: fileURLToPath(new URL('./index.ts', import.meta.url)) })
  let stopping = false
  let restarts: number[] = []
  const fork = () => cluster.fork()
  for (let i = 0; i < count; i++) fork()
  cluster.on('exit', (worker: Worker, code) => {
    if (stopping) return
    restarts = [...restarts.filter((at) => at > Date.now() - 60_000), Date.now()]
    if (restarts.length > RESTART_LIMIT) {
      console.error('app processes keep dying; stopping')
      return stop(1)
    }
    console.error(`app process ${worker.process.pid} exited (${code}); starting another`)
    fork()
  })
  const stop = (code = 0) => {
    stopping = true
    const workers = Object.values(cluster.workers ?? {})
    for (const worker of workers) worker?.process.kill('SIGTERM')
    let left = workers.length
    if (!left) process.exit(code)
    cluster.on('exit', () => --left <= 0 && process.exit(code))
    setTimeout(() => process.exit(1), 10_000).unref()
  }
  process.on('SIGINT', () => stop())
  process.on('SIGTERM', () => stop())
}

const count = workersWanted()
if (cluster.isPrimary && count > 1) runPrimary(count)
else await import('./index')
