// PostgreSQL's programs: finding Debian's binaries (installing them as root when missing) and running
// the server tools as the cluster's owner (the postgres user when we are root).
import { execFileSync } from 'node:child_process'
import { existsSync, readdirSync } from 'node:fs'
import path from 'node:path'
import { IS_ROOT } from './cluster-home.mjs'
import { log } from './proc.mjs'

/** The newest /usr/lib/postgresql/<version>/bin, or null. */
export function findBinDir() {
  const base = '/usr/lib/postgresql'
  if (!existsSync(base)) return null
  const versions = readdirSync(base).filter((v) => existsSync(path.join(base, v, 'bin', 'initdb')))
  versions.sort((a, b) => Number(b) - Number(a))
  return versions.length ? path.join(base, versions[0], 'bin') : null
}

/** Installs PostgreSQL from Debian's packages when no server binaries are present. */
export function ensureInstalled() {
  let bin = findBinDir()
  if (bin) return bin
  if (!IS_ROOT)
    throw new Error('PostgreSQL is not installed; run as root once, or: apt-get install postgresql')
  log('db', 'installing PostgreSQL from Debian packages (first run only)…')
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' }
  execFileSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env })
  execFileSync('apt-get', ['install', '-y', '-qq', 'postgresql'], { stdio: 'inherit', env })
  bin = findBinDir()
  if (!bin) throw new Error('PostgreSQL install finished but no server binaries were found')
  return bin
}

/** Runs a server tool as the cluster owner (the postgres user when we are root), from /. */
export function asOwner(bin, tool, args, options = {}) {
  const file = path.join(bin, tool)
  if (!IS_ROOT) return execFileSync(file, args, { stdio: 'pipe', ...options })
  return execFileSync('runuser', ['-u', 'postgres', '--', file, ...args], {
    cwd: '/',
    stdio: 'pipe',
    ...options,
  })
}

/** An Error that says what failed, followed by the tool's own words (its stderr). */
export function toolFailure(what, error) {
  const said = String(error.stderr ?? '').trim() || error.message
  return new Error(`${what}\n${said}`)
}
