// The API as a real child process (server/index.ts) on a database of the test's own, for tests that
// kill it: start, wait until it answers, SIGKILL, start again on the same port.
import type { ChildProcess } from 'node:child_process'
import { freePort, startService, stopService } from '../../scripts/lib/proc.mjs'

export interface ApiProcess {
  readonly url: string
  /** Starts the server (again) and resolves once /api/health answers. */
  start(): Promise<void>
  /** SIGKILL: no shutdown hook runs, requests in flight are cut off. */
  kill(): Promise<void>
  /** SIGTERM, the ordinary stop. */
  stop(): Promise<void>
}

const STARTUP_POLLS = 600 // × 100 ms: tsx and a loaded two-core machine can take a while

async function answersHealth(url: string) {
  for (let i = 0; i < STARTUP_POLLS; i++) {
    const ok = await fetch(`${url}/api/health`).then(
      (r) => r.ok,
      () => false,
    )
    if (ok) return
    await new Promise((resolve) => setTimeout(resolve, 100))
  }
  throw new Error(`the API at ${url} did not answer`)
}

/** An API process on `databaseUrl` with the given session key (cookies signed with it work). */
export async function apiProcess(
  databaseUrl: string,
  jwtSecret: string,
  moreEnv: Record<string, string> = {},
): Promise<ApiProcess> {
  const port = await freePort()
  const url = `http://127.0.0.1:${port}`
  const env = {
    ...process.env,
    DATABASE_URL: databaseUrl,
    JWT_SECRET: jwtSecret,
    PORT: String(port),
    HOST: '127.0.0.1',
    LOG_LEVEL: 'silent',
    CLIENT_DIST: '/nonexistent',
    SMTP_PORT: String(await freePort()),
    ...moreEnv,
  }
  let child: ChildProcess | undefined
  return {
    url,
    async start() {
      child = startService(
        'api-process',
        process.execPath,
        ['--import', 'tsx', 'server/index.ts'],
        {
          env,
        },
      )
      await answersHealth(url)
    },
    async kill() {
      const running = child
      if (!running || running.exitCode !== null || running.signalCode !== null) return
      await new Promise((resolve) => {
        running.once('exit', resolve)
        running.kill('SIGKILL')
      })
    },
    stop: () => stopService(child),
  }
}
