#!/usr/bin/env node
// npm run db:backup [-- --keep N]: pg_dump (custom format) of the app database into .data/backups
// (AMBITUS_BACKUP_DIR), then deletes all but the newest N backups of it (AMBITUS_BACKUP_KEEP, 14).
import { pathToFileURL } from 'node:url'
import { databaseUrl } from './lib/paths.mjs'
import { log } from './lib/proc.mjs'
import {
  databaseName,
  dumpDatabase,
  formatBytes,
  keepCount,
  rotate,
  runWithCluster,
  shown,
} from './lib/backups.mjs'

/** Backs up the app database (DATABASE_URL, or the local cluster's); returns the new file. */
export async function backup(argv = []) {
  const keep = keepCount(argv)
  const url = databaseUrl()
  const database = databaseName(url)
  const started = performance.now()
  const { file, bytes } = await dumpDatabase(url)
  const seconds = ((performance.now() - started) / 1000).toFixed(1)
  log('backup', `${database} → ${shown(file)} (${formatBytes(bytes)}, ${seconds} s)`)
  const removed = rotate(database, keep)
  log(
    'backup',
    `keeping the newest ${keep}${removed.length ? `; removed ${removed.length} older` : ''}`,
  )
  return file
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  await runWithCluster('backup', () => backup(process.argv.slice(2)))
}
