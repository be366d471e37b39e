#!/usr/bin/env node
// Project-local PostgreSQL: installs Debian's server when missing, keeps a cluster in .data/pg,
// listens on 127.0.0.1 only. Usage: node scripts/db.mjs start|stop|status|create <db>|drop <db>
import { execFileSync } from 'node:child_process'
import { chownSync, existsSync, mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs'
import path from 'node:path'
import { pathToFileURL } from 'node:url'
import { DATA_DIR, PG_HOST, PG_PORT, PG_USER, databaseUrl, localSecret } from './lib/paths.mjs'
import { log } from './lib/proc.mjs'

export const CLUSTER_DIR = path.join(DATA_DIR, 'pg')
const LOG_FILE = path.join(DATA_DIR, 'postgres.log')
const IS_ROOT = process.getuid?.() === 0

function findBinDir() {
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

/** Runs a PostgreSQL tool as the cluster owner (the postgres user when we are root). */
function asOwner(bin, tool, args, options = {}) {
  const file = path.join(bin, tool)
  if (!IS_ROOT) return execFileSync(file, args, { stdio: 'pipe', ...options })
  return execFileSync('runuser', ['-u', 'postgres', '--', file, ...args], {
    cwd: '/',
    stdio: 'pipe',
    ...options,
  })
}

function initCluster(bin) {
  log('db', `creating cluster in ${CLUSTER_DIR}`)
  mkdirSync(CLUSTER_DIR, { recursive: true, mode: 0o700 })
  const pwFile = path.join(DATA_DIR, 'initdb-pw')
  writeFileSync(pwFile, localSecret('postgres'), { mode: 0o600 })
  if (IS_ROOT) {
    const { uid, gid } = postgresIds()
    chownSync(CLUSTER_DIR, uid, gid)
    chownSync(pwFile, uid, gid)
  }
  const args = [
    '-D',
    CLUSTER_DIR,
    '-U',
    PG_USER,
    '--pwfile',
    pwFile,
    '-E',
    'UTF8',
    '--locale=C.UTF-8',
  ]
  asOwner(bin, 'initdb', [...args, '--auth-host=scram-sha-256', '--auth-local=peer'])
  execFileSync('rm', ['-f', pwFile])
}

function postgresIds() {
  const line = readFileSync('/etc/passwd', 'utf8')
    .split('\n')
    .find((l) => l.startsWith('postgres:'))
  if (!line)
    throw new Error('the postgres system user is missing (is the postgresql package installed?)')
  const [, , uid, gid] = line.split(':')
  return { uid: Number(uid), gid: Number(gid) }
}

/** The port the running cluster listens on, or null when it is not running. */
function runningPort() {
  const pidFile = path.join(CLUSTER_DIR, 'postmaster.pid')
  if (!existsSync(pidFile)) return null
  const lines = readFileSync(pidFile, 'utf8').split('\n')
  try {
    process.kill(Number(lines[0]), 0)
  } catch (error) {
    if (error.code === 'ESRCH') return null
  }
  return Number(lines[3])
}

/** Installs, initialises and starts the cluster; returns true when this call started it. */
export async function startCluster() {
  if (process.env.DATABASE_URL) return false
  mkdirSync(DATA_DIR, { recursive: true, mode: 0o755 })
  const bin = ensureInstalled()
  if (!existsSync(path.join(CLUSTER_DIR, 'PG_VERSION'))) initCluster(bin)
  const port = runningPort()
  if (port === PG_PORT) return false
  if (port !== null) stopCluster()
  const options = `-p ${PG_PORT} -c listen_addresses=${PG_HOST} -c unix_socket_directories=''`
  if (IS_ROOT && !existsSync(LOG_FILE)) writeFileSync(LOG_FILE, '')
  if (IS_ROOT) chownSync(LOG_FILE, postgresIds().uid, postgresIds().gid)
  asOwner(bin, 'pg_ctl', [
    'start',
    '-D',
    CLUSTER_DIR,
    '-l',
    LOG_FILE,
    '-w',
    '-t',
    '60',
    '-o',
    options,
  ])
  log('db', `PostgreSQL listening on ${PG_HOST}:${PG_PORT}`)
  return true
}

/** Stops the cluster (fast shutdown: open sessions are closed, data is kept). */
export function stopCluster() {
  const bin = findBinDir()
  if (!bin || runningPort() === null) return
  asOwner(bin, 'pg_ctl', ['stop', '-D', CLUSTER_DIR, '-m', 'fast', '-w'])
  log('db', 'PostgreSQL stopped')
}

async function withAdmin(work) {
  const { default: pg } = await import('pg')
  const client = new pg.Client({ connectionString: databaseUrl('postgres') })
  await client.connect()
  try {
    return await work(client)
  } finally {
    await client.end()
  }
}

const quoteIdent = (name) => `"${name.replace(/"/g, '""')}"`

/** Creates a database in the local cluster unless it exists; returns true when created. */
export async function createDatabase(name) {
  return withAdmin(async (client) => {
    const found = await client.query('select 1 from pg_database where datname = $1', [name])
    if (found.rowCount) return false
    await client.query(`create database ${quoteIdent(name)}`)
    return true
  })
}

/** Drops a database (closing its connections) when it exists. */
export async function dropDatabase(name) {
  await withAdmin((client) =>
    client.query(`drop database if exists ${quoteIdent(name)} with (force)`),
  )
}

async function main([command, name]) {
  if (command === 'start') await startCluster()
  else if (command === 'stop') stopCluster()
  else if (command === 'status')
    console.log(runningPort() ? `running on ${runningPort()}` : 'stopped')
  else if (command === 'create' && name)
    console.log((await createDatabase(name)) ? 'created' : 'exists')
  else if (command === 'drop' && name) await dropDatabase(name)
  else if (command === 'url') console.log(databaseUrl(name))
  else
    throw new Error('usage: node scripts/db.mjs start|stop|status|create <db>|drop <db>|url [db]')
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  main(process.argv.slice(2)).catch((error) => {
    console.error(error.message)
    process.exit(1)
  })
}
