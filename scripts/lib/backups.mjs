// Shared parts of db:backup and db:restore: where backups live, how they are named and rotated, and
// running pg_dump / pg_restore against a database URL without putting its password on a command line.
import { execFile } from 'node:child_process'
import { chmodSync, closeSync, mkdirSync, openSync, readSync, readdirSync } from 'node:fs'
import { renameSync, rmSync, statSync } from 'node:fs'
import path from 'node:path'
import { DATA_DIR } from './paths.mjs'
import { ensureInstalled, toolFailure } from './pg-tools.mjs'

export const BACKUP_DIR = process.env.AMBITUS_BACKUP_DIR ?? path.join(DATA_DIR, 'backups')
export const DEFAULT_KEEP = 14
/** Automatic copies taken just before a restore replaces a database. */
export const BEFORE_RESTORE = 'before-restore-'

/** How many backups to keep: --keep N, else AMBITUS_BACKUP_KEEP, else 14. */
export function keepCount(argv) {
  const flag = argv.indexOf('--keep')
  const raw = flag >= 0 ? argv[flag + 1] : (process.env.AMBITUS_BACKUP_KEEP ?? String(DEFAULT_KEEP))
  const keep = Number(raw)
  if (!Number.isInteger(keep) || keep < 1)
    throw new Error(`the number of backups to keep must be a whole number ≥ 1 (got "${raw}")`)
  return keep
}

/** The database a URL names. */
export const databaseName = (url) => decodeURIComponent(new URL(url).pathname.slice(1))

/** A sortable file name: <prefix><database>-2026-05-04T10-22-31-123Z.dump */
export function backupFileName(database, prefix = '') {
  const stamp = new Date().toISOString().replace(/[:.]/g, '-')
  return `${prefix}${database}-${stamp}.dump`
}

/** The backups of a database in BACKUP_DIR, oldest first (full paths). */
export function listBackups(database, prefix = '') {
  let names = []
  try {
    names = readdirSync(BACKUP_DIR)
  } catch {
    return []
  }
  const pattern = new RegExp(
    `^${prefix}${escapeRegExp(database)}-\\d{4}-\\d\\d-\\d\\dT[\\d-]+Z\\.dump$`,
  )
  return names
    .filter((n) => pattern.test(n))
    .sort()
    .map((n) => path.join(BACKUP_DIR, n))
}

const escapeRegExp = (text) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')

/** Deletes all but the newest `keep` backups of a database; returns the deleted files. */
export function rotate(database, keep, prefix = '') {
  const old = listBackups(database, prefix).slice(0, -keep)
  for (const file of old) rmSync(file)
  return old
}

/**
 * Runs a PostgreSQL client tool on a database URL; the password travels in PGPASSWORD.
 * `withDatabase: false` leaves the URL out (pg_restore writing a script to a file).
 */
export function runTool(tool, url, args, { withDatabase = true } = {}) {
  const target = new URL(url)
  const env = { ...process.env, PGPASSWORD: decodeURIComponent(target.password) }
  target.password = ''
  const file = path.join(ensureInstalled(), tool)
  return new Promise((resolve, reject) => {
    const database = withDatabase ? [`--dbname=${target.href}`] : []
    execFile(file, [...args, ...database], { env }, (error, stdout, stderr) => {
      if (error) reject(toolFailure(`${tool} failed`, { stderr, message: error.message }))
      else resolve(stdout)
    })
  })
}

/** pg_dump in custom format to a file in BACKUP_DIR (written aside, then renamed into place). */
export async function dumpDatabase(url, prefix = '') {
  mkdirSync(BACKUP_DIR, { recursive: true, mode: 0o700 })
  const file = path.join(BACKUP_DIR, backupFileName(databaseName(url), prefix))
  const partial = `${file}.partial`
  try {
    await runTool('pg_dump', url, ['--format=custom', `--file=${partial}`])
    chmodSync(partial, 0o600) // it holds password hashes and everyone's practice
    renameSync(partial, file)
  } finally {
    rmSync(partial, { force: true })
  }
  return { file, bytes: statSync(file).size }
}

/** True when the file starts like a pg_dump custom-format archive. */
export function isCustomArchive(file) {
  const head = Buffer.alloc(5)
  const fd = openSync(file, 'r')
  try {
    readSync(fd, head, 0, 5, 0)
  } finally {
    closeSync(fd)
  }
  return head.toString('latin1') === 'PGDMP'
}

/** A path as a person wants to read it: relative when under the current folder. */
export function shown(file) {
  const relative = path.relative(process.cwd(), file)
  return relative.startsWith('..') ? file : relative
}

/** "1.4 MB" */
export function formatBytes(bytes) {
  if (bytes < 1024) return `${bytes} B`
  if (bytes < 1024 ** 2) return `${(bytes / 1024).toFixed(1)} kB`
  return `${(bytes / 1024 ** 2).toFixed(1)} MB`
}

/** Runs a command-line tool's work with the local cluster up (and stops it after, if it started it). */
export async function runWithCluster(tag, work) {
  const db = await import('../db.mjs')
  let startedDb = false
  try {
    startedDb = await db.startCluster()
    await work()
  } catch (error) {
    console.error(`[${tag}] ${error.message}`)
    process.exitCode = 1
  } finally {
    if (startedDb) db.stopCluster()
  }
}
