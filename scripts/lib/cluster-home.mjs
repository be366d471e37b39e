// Where the local PostgreSQL cluster lives and who runs it. As a plain user: in the data folder, run
// as that user. As root (PostgreSQL refuses to run as root): in /var/lib/ambitus/<checkout key>/, a
// folder the postgres user owns, so a checkout in a private folder (e.g. /root/x, mode 700) works.
import { createHash } from 'node:crypto'
import { chownSync, existsSync, mkdirSync, readFileSync, realpathSync, statSync } from 'node:fs'
import { writeFileSync } from 'node:fs'
import path from 'node:path'
import { DATA_DIR } from './paths.mjs'

export const IS_ROOT = process.getuid?.() === 0
/** Parent of the per-checkout cluster folders used when running as root. */
export const SHARED_HOME = process.env.AMBITUS_CLUSTER_HOME ?? '/var/lib/ambitus'

/** uid and gid of the postgres system user (root runs the cluster through it). */
export function postgresIds() {
  const line = readFileSync('/etc/passwd', 'utf8')
    .split('\n')
    .find((l) => l.startsWith('postgres:'))
  if (!line)
    throw new Error('the postgres system user is missing (is the postgresql package installed?)')
  const [, , uid, gid] = line.split(':')
  return { uid: Number(uid), gid: Number(gid) }
}

/** Creates the data folder (secrets, backups) with a readable message when that is not allowed. */
export function ensureDataDir() {
  try {
    mkdirSync(DATA_DIR, { recursive: true, mode: 0o755 })
  } catch (error) {
    throw new Error(
      `cannot create the data folder ${DATA_DIR} (${error.code}): make it writable for this user, ` +
        'or set AMBITUS_DATA_DIR to a folder you own',
    )
  }
  return realpathSync(DATA_DIR)
}

/** A stable folder name for this checkout: its data folder's name and a hash of its real path. */
export function checkoutKey(dataDir = ensureDataDir()) {
  const hash = createHash('sha256').update(dataDir).digest('hex').slice(0, 12)
  const name = path.basename(path.dirname(dataDir)).replace(/[^a-zA-Z0-9_.-]/g, '_') || 'root'
  return `${name}-${hash}`
}

/**
 * The folders of this checkout's cluster: `home` holds `pg/` (the cluster) and `postgres.log`.
 * A cluster made earlier in the data folder keeps being used there.
 */
export function clusterHome() {
  const dataDir = ensureDataDir()
  const legacy = existsSync(path.join(dataDir, 'pg', 'PG_VERSION'))
  const home = legacy || !IS_ROOT ? dataDir : path.join(SHARED_HOME, checkoutKey(dataDir))
  return {
    home,
    cluster: path.join(home, 'pg'),
    logFile: path.join(home, 'postgres.log'),
    shared: home !== dataDir,
  }
}

/** Creates the shared cluster folder for root: owned by postgres, mode 700, naming its checkout. */
export function prepareSharedHome(home) {
  const { uid, gid } = postgresIds()
  mkdirSync(SHARED_HOME, { recursive: true, mode: 0o755 })
  mkdirSync(home, { recursive: true, mode: 0o700 })
  // Tells whoever looks in /var/lib/ambitus which checkout a folder belongs to.
  writeFileSync(path.join(home, 'checkout'), `${ensureDataDir()}\n`)
  chownSync(path.join(home, 'checkout'), uid, gid)
  chownSync(home, uid, gid)
}

function canEnter(stats, uid, gid) {
  if (stats.uid === uid) return (stats.mode & 0o100) !== 0
  if (stats.gid === gid) return (stats.mode & 0o010) !== 0
  return (stats.mode & 0o001) !== 0
}

/** The first folder on the way to dir that the postgres user cannot enter, or null. */
export function folderBlockingPostgres(dir) {
  if (!IS_ROOT) return null
  const { uid, gid } = postgresIds()
  const parts = path.resolve(dir).split(path.sep).filter(Boolean)
  for (let i = 0; i <= parts.length; i++) {
    const folder = path.sep + parts.slice(0, i).join(path.sep)
    if (!canEnter(statSync(folder), uid, gid)) return folder
  }
  return null
}
