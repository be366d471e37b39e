// Set-up steps shared by start, dev and test: dependencies, database, client build.
import { existsSync, readdirSync, statSync } from 'node:fs'
import path from 'node:path'
import { APP_DATABASE, ROOT, databaseUrl } from './paths.mjs'
import { log, runOrThrow } from './proc.mjs'

const mtime = (file) => (existsSync(file) ? statSync(file).mtimeMs : 0)

/** Installs dependencies when node_modules is missing or older than the lock file. */
export async function ensureDependencies() {
  const lock = path.join(ROOT, 'package-lock.json')
  const installed = path.join(ROOT, 'node_modules', '.package-lock.json')
  if (existsSync(installed) && mtime(installed) >= mtime(lock)) return
  log('setup', 'installing dependencies (npm ci)…')
  await runOrThrow('npm', ['ci', '--no-audit', '--no-fund'])
}

/** Runs migrations and (unless disabled) the one-time demo seed on a database of the local cluster. */
export async function prepareDatabase(database, { seed = true } = {}) {
  const { createDatabase } = await import('../db.mjs')
  const external = Boolean(process.env.DATABASE_URL) && database === APP_DATABASE
  if (!external && (await createDatabase(database))) log('db', `created database ${database}`)
  const env = { ...process.env, DATABASE_URL: databaseUrl(database) }
  const args = ['--import', 'tsx', 'scripts/prepare-db.ts', ...(seed ? [] : ['--no-seed'])]
  await runOrThrow(process.execPath, args, { env })
}

function newestMtime(dir) {
  if (!existsSync(dir)) return 0
  if (!statSync(dir).isDirectory()) return mtime(dir)
  let newest = 0
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name)
    newest = Math.max(newest, entry.isDirectory() ? newestMtime(full) : statSync(full).mtimeMs)
  }
  return newest
}

/** Builds the client into outDir when any client source is newer than the last build. */
export async function ensureClientBuild(outDir = path.join(ROOT, 'dist')) {
  const sources = ['src', 'public', 'index.html', 'vite.config.ts', 'package-lock.json']
  const newestSource = Math.max(...sources.map((s) => newestMtime(path.join(ROOT, s))))
  if (mtime(path.join(outDir, 'index.html')) > newestSource) return
  log('setup', 'building the client…')
  // NODE_ENV=production even when called from Vitest (which sets "test"): the real production bundle.
  const env = { ...process.env, NODE_ENV: 'production' }
  await runOrThrow(
    process.execPath,
    ['node_modules/vite/bin/vite.js', 'build', '--outDir', outDir, '--emptyOutDir'],
    { env },
  )
}
