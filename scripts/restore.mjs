#!/usr/bin/env node
// npm run db:restore -- <file|latest> [--yes]: replaces the app database with a db:backup archive.
// Locally the archive is restored into a new database first and swapped in only when that worked;
// the data it replaces is saved as a before-restore-… backup. Without --yes it asks on a terminal.
import { existsSync, rmSync } from 'node:fs'
import path from 'node:path'
import { createInterface } from 'node:readline/promises'
import { pathToFileURL } from 'node:url'
import { databaseUrl } from './lib/paths.mjs'
import { log } from './lib/proc.mjs'
import * as backups from './lib/backups.mjs'

const USAGE = 'usage: npm run db:restore -- <backup file | latest> [--yes]'

/** The archive to restore: a path, a name inside the backup folder, or "latest". */
export function findArchive(wanted, database) {
  const file =
    wanted === 'latest'
      ? backups.listBackups(database).at(-1)
      : [path.resolve(wanted), path.join(backups.BACKUP_DIR, wanted)].find((f) => existsSync(f))
  if (!file) throw new Error(`no backup found for "${wanted}"\n${listing(database)}`)
  if (!backups.isCustomArchive(file))
    throw new Error(`${file} is not a pg_dump custom-format archive (made by npm run db:backup)`)
  return file
}

function listing(database) {
  const files = backups.listBackups(database).reverse()
  if (!files.length) return `no backups of ${database} in ${backups.BACKUP_DIR} yet`
  return `backups of ${database}, newest first:\n${files.map((f) => `  ${path.basename(f)}`).join('\n')}`
}

async function confirmed(database, file, argv) {
  if (argv.includes('--yes')) return true
  if (!process.stdin.isTTY)
    throw new Error('not restoring without confirmation: add --yes to run it from a script')
  const terminal = createInterface({ input: process.stdin, output: process.stdout })
  const question = `This replaces ALL data in database "${database}" with ${path.basename(file)}.\nType the database name to go on: `
  const answer = await terminal.question(question)
  terminal.close()
  return answer.trim() === database
}

/** Local cluster: restore into <db>__restoring, then swap it in; the old data is kept aside first. */
async function restoreLocal(database, file) {
  const db = await import('./db.mjs')
  const staging = `${database}__restoring`
  await db.dropDatabase(staging)
  await db.createDatabase(staging)
  try {
    await pgRestore(databaseUrl(staging), file, [])
  } catch (error) {
    await db.dropDatabase(staging)
    throw error
  }
  if (await db.databaseExists(database)) {
    await keepCurrent(databaseUrl(database))
    const replaced = `${database}__replaced`
    await db.dropDatabase(replaced)
    await db.renameDatabase(database, replaced)
    await db.renameDatabase(staging, database)
    await db.dropDatabase(replaced)
  } else await db.renameDatabase(staging, database)
}

/**
 * Another server (DATABASE_URL): the public schema is emptied and the archive restored in one
 * transaction (psql). pg_restore --clean cannot drop the keys of partitioned tables (attempts).
 */
async function restoreExternal(url, file) {
  await keepCurrent(url)
  const script = `${file}.restore.sql`
  try {
    await backups.runTool('pg_restore', url, ['--no-owner', '--no-acl', `--file=${script}`, file], {
      withDatabase: false,
    })
    const psql = ['-X', '-q', '--single-transaction', '-v', 'ON_ERROR_STOP=1']
    const empty = 'drop schema public cascade; create schema public;'
    await backups.runTool('psql', url, [...psql, '-c', empty, '-f', script])
  } finally {
    rmSync(script, { force: true })
  }
}

async function keepCurrent(url) {
  const { file } = await backups.dumpDatabase(url, backups.BEFORE_RESTORE)
  backups.rotate(backups.databaseName(url), backups.keepCount([]), backups.BEFORE_RESTORE)
  log('restore', `the data being replaced is saved in ${backups.shown(file)}`)
}

function pgRestore(url, file, extra) {
  const args = ['--no-owner', '--no-acl', '--single-transaction', '--exit-on-error', ...extra]
  return backups.runTool('pg_restore', url, [...args, file])
}

/** Restores an archive into the app database after confirmation; returns false when declined. */
export async function restore(argv) {
  const wanted = argv.find((a) => !a.startsWith('--'))
  const url = databaseUrl()
  const database = backups.databaseName(url)
  if (!wanted) throw new Error(`${USAGE}\n${listing(database)}`)
  const file = findArchive(wanted, database)
  if (!(await confirmed(database, file, argv))) return false
  if (process.env.DATABASE_URL) await restoreExternal(url, file)
  else await restoreLocal(database, file)
  log(
    'restore',
    `${database} now holds ${path.basename(file)}; npm start migrates it forward if needed`,
  )
  return true
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  await backups.runWithCluster('restore', async () => {
    if (!(await restore(process.argv.slice(2))))
      log('restore', 'not confirmed: nothing was changed')
  })
}
