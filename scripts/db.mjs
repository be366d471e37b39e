#!/usr/bin/env node
// Project-local PostgreSQL: installs Debian's server when missing, keeps this checkout's own cluster
// (see lib/cluster-home.mjs for where), listens on 127.0.0.1 only.
// Usage: node scripts/db.mjs start|stop|status|create <db>|drop <db>|url [db]|destroy
import { chownSync, existsSync, readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs'
import net from 'node:net'
import path from 'node:path'
import { pathToFileURL } from 'node:url'
import { DATA_DIR, PG_HOST, PG_PORT, PG_USER, databaseUrl, localSecret } from './lib/paths.mjs'
import { log } from './lib/proc.mjs'
import {
  IS_ROOT,
  clusterHome,
  folderBlockingPostgres,
  postgresIds,
  prepareSharedHome,
} from './lib/cluster-home.mjs'
import { asOwner, ensureInstalled, findBinDir, toolFailure } from './lib/pg-tools.mjs'

let location = null
/** This checkout's cluster folders `{ home, cluster, logFile, shared }`, decided on first use. */
export const clusterLocation = () => (location ??= clusterHome())

function initCluster(bin) {
  const { home, cluster, shared } = clusterLocation()
  log('db', `creating cluster in ${cluster}`)
  if (shared) prepareSharedHome(home)
  // The password file sits beside the cluster, where its owner can read it.
  const pwFile = path.join(home, 'initdb-pw')
  writeFileSync(pwFile, localSecret('postgres'), { mode: 0o600 })
  if (IS_ROOT) chownSync(pwFile, postgresIds().uid, postgresIds().gid)
  const args = ['-D', cluster, '-U', PG_USER, '--pwfile', pwFile, '-E', 'UTF8']
  try {
    asOwner(bin, 'initdb', [
      ...args,
      '--locale=C.UTF-8',
      '--auth-host=scram-sha-256',
      '--auth-local=peer',
    ])
  } catch (error) {
    throw toolFailure('initdb could not create the cluster', error)
  } finally {
    rmSync(pwFile, { force: true })
  }
}

/**
 * A shared-home cluster left by an earlier checkout at this path (deleted, then cloned again): its
 * password went with that checkout's data folder, so it is moved aside (kept, never deleted) and a
 * new one is made.
 */
function setAsideOrphan() {
  const { cluster, shared } = clusterLocation()
  if (!shared || !existsSync(path.join(cluster, 'PG_VERSION'))) return
  if (existsSync(path.join(DATA_DIR, 'postgres.secret'))) return
  if (runningPort() !== null) stopCluster()
  const aside = `${cluster}.orphaned-${Date.now()}`
  renameSync(cluster, aside)
  log('db', `an earlier checkout's cluster (password unknown here) moved aside to ${aside}`)
}

/** The port the running cluster listens on, or null when it is not running. */
function runningPort() {
  const pidFile = path.join(clusterLocation().cluster, 'postmaster.pid')
  if (!existsSync(pidFile)) return null
  const lines = readFileSync(pidFile, 'utf8').split('\n')
  try {
    process.kill(Number(lines[0]), 0)
  } catch (error) {
    if (error.code === 'ESRCH') return null
  }
  return Number(lines[3])
}

function portTaken(port) {
  return new Promise((resolve) => {
    const socket = net.connect({ host: PG_HOST, port })
    socket.once('connect', () => (socket.destroy(), resolve(true)))
    socket.once('error', () => resolve(false))
  })
}

/** Says plainly why the cluster cannot start, before pg_ctl fails with a terse message. */
async function checkStartable() {
  const { cluster } = clusterLocation()
  const blocking = folderBlockingPostgres(cluster)
  if (blocking)
    throw new Error(
      `the cluster in ${cluster} runs as the postgres user, who cannot enter ${blocking}. ` +
        `Move the checkout to a folder others can enter, or remove ${cluster} (its data is ` +
        'lost; back it up first) so that a new cluster is made outside the checkout.',
    )
  if (await portTaken(PG_PORT))
    throw new Error(
      `port ${PG_PORT} on ${PG_HOST} is already taken (another checkout's cluster?). ` +
        'Give each checkout its own port, e.g. PGPORT=54330 npm start',
    )
}

function tailOfLog(logFile) {
  if (!existsSync(logFile)) return ''
  return readFileSync(logFile, 'utf8').trim().split('\n').slice(-8).join('\n')
}

/** Installs, initialises and starts the cluster; returns true when this call started it. */
export async function startCluster() {
  if (process.env.DATABASE_URL) return false
  const bin = ensureInstalled()
  const { cluster, logFile } = clusterLocation()
  setAsideOrphan()
  if (!existsSync(path.join(cluster, 'PG_VERSION'))) initCluster(bin)
  const port = runningPort()
  if (port === PG_PORT) return false
  if (port !== null) stopCluster()
  await checkStartable()
  const options = `-p ${PG_PORT} -c listen_addresses=${PG_HOST} -c unix_socket_directories=''`
  if (IS_ROOT && !existsSync(logFile)) writeFileSync(logFile, '')
  if (IS_ROOT) chownSync(logFile, postgresIds().uid, postgresIds().gid)
  const args = ['start', '-D', cluster, '-l', logFile, '-w', '-t', '60', '-o', options]
  try {
    asOwner(bin, 'pg_ctl', args)
  } catch (error) {
    throw toolFailure(`PostgreSQL did not start (log ${logFile}):\n${tailOfLog(logFile)}`, error)
  }
  log('db', `PostgreSQL listening on ${PG_HOST}:${PG_PORT}`)
  return true
}

/** Stops the cluster (fast shutdown: open sessions are closed, data is kept). */
export function stopCluster() {
  const bin = findBinDir()
  if (!bin || runningPort() === null) return
  asOwner(bin, 'pg_ctl', ['stop', '-D', clusterLocation().cluster, '-m', 'fast', '-w'])
  log('db', 'PostgreSQL stopped')
}

/** Stops the cluster and deletes it with every database in it (the checkout's secrets stay). */
export function destroyCluster() {
  const { home, cluster, logFile, shared } = clusterLocation()
  stopCluster()
  rmSync(cluster, { recursive: true, force: true })
  rmSync(logFile, { force: true })
  if (shared) rmSync(home, { recursive: true, force: true })
  log('db', `cluster ${cluster} deleted`)
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
  if (await databaseExists(name)) return false
  await withAdmin((client) => client.query(`create database ${quoteIdent(name)}`))
  return true
}

/** True when the local cluster has a database of that name. */
export async function databaseExists(name) {
  return withAdmin(async (client) => {
    const found = await client.query('select 1 from pg_database where datname = $1', [name])
    return found.rowCount > 0
  })
}

/** Drops a database (closing its connections) when it exists. */
export async function dropDatabase(name) {
  await withAdmin((client) =>
    client.query(`drop database if exists ${quoteIdent(name)} with (force)`),
  )
}

/** Renames a database, closing the sessions on either name first (a running app reconnects). */
export async function renameDatabase(from, to) {
  await withAdmin(async (client) => {
    const close =
      'select pg_terminate_backend(pid) from pg_stat_activity where datname = any($1::text[])'
    for (let attempt = 1; ; attempt++) {
      await client.query(close, [[from, to]])
      try {
        return await client.query(`alter database ${quoteIdent(from)} rename to ${quoteIdent(to)}`)
      } catch (error) {
        // 55006: a client reconnected in between; try again a few times.
        if (error.code !== '55006' || attempt === 5) throw error
      }
    }
  })
}

function status() {
  const port = runningPort()
  const state = port ? `running on ${PG_HOST}:${port}` : 'stopped'
  return `${state} (cluster in ${clusterLocation().cluster})`
}

async function main([command, name]) {
  if (command === 'start') await startCluster()
  else if (command === 'stop') stopCluster()
  else if (command === 'status') console.log(status())
  else if (command === 'create' && name)
    console.log((await createDatabase(name)) ? 'created' : 'exists')
  else if (command === 'drop' && name) await dropDatabase(name)
  else if (command === 'url') console.log(databaseUrl(name))
  else if (command === 'destroy') destroyCluster()
  else
    throw new Error(
      'usage: node scripts/db.mjs start|stop|status|create <db>|drop <db>|url [db]|destroy',
    )
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  main(process.argv.slice(2)).catch((error) => {
    console.error(`[db] ${error.message}`)
    process.exit(1)
  })
}
