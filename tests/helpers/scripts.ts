// Runs the project's own command-line scripts as an operator would, with a clean environment.
import { runCaptured } from '../../scripts/lib/proc.mjs'
import { ROOT } from '../../scripts/lib/paths.mjs'

/**
 * Time allowed for a test that runs several scripts as their own Node processes (each start costs
 * well under a second on an idle machine, many seconds on two cores shared with other test runs).
 */
export const SCRIPT_TIMEOUT = 180_000

/** The test process's environment without its database choice, plus the given variables. */
export function scriptEnv(vars: Record<string, string>): NodeJS.ProcessEnv {
  const env: NodeJS.ProcessEnv = { ...process.env, ...vars }
  for (const name of ['DATABASE_URL', 'AMBITUS_DATABASE', 'AMBITUS_DATA_DIR'])
    if (!(name in vars)) delete env[name]
  return env
}

/** `node <script> …args` in a checkout; resolves to its exit code and everything it printed. */
export function runScript(script: string, args: string[], env: NodeJS.ProcessEnv, cwd = ROOT) {
  return runCaptured(process.execPath, [script, ...args], { cwd, env })
}
