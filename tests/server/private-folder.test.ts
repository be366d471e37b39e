// A checkout in a folder only its owner can enter (mode 700, like a clone under /root) still gets its
// own PostgreSQL cluster: as root it lives where the postgres user can reach it, outside the checkout.
import {
  cpSync,
  mkdirSync,
  mkdtempSync,
  rmSync,
  statSync,
  symlinkSync,
  writeFileSync,
} from 'node:fs'
import { chmodSync } from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import pg from 'pg'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { IS_ROOT } from '../../scripts/lib/cluster-home.mjs'
import { ROOT } from '../../scripts/lib/paths.mjs'
import { freePort, runCaptured } from '../../scripts/lib/proc.mjs'
import { runScript, SCRIPT_TIMEOUT, scriptEnv } from '../helpers/scripts'

const PRIVATE = mkdtempSync(path.join(os.tmpdir(), 'ambitus-private-'))
const CHECKOUT = path.join(PRIVATE, 'ambitus')
let env: NodeJS.ProcessEnv

const db = (...args: string[]) => runScript('scripts/db.mjs', args, env, CHECKOUT)

beforeAll(async () => {
  chmodSync(PRIVATE, 0o700)
  const clone = await runCaptured('git', ['clone', '--quiet', ROOT, CHECKOUT])
  expect(clone.code, clone.output).toBe(0)
  // The scripts under test as they are in this working tree (a clone holds the last commit).
  cpSync(path.join(ROOT, 'scripts'), path.join(CHECKOUT, 'scripts'), { recursive: true })
  symlinkSync(path.join(ROOT, 'node_modules'), path.join(CHECKOUT, 'node_modules'))
  env = scriptEnv({ PGPORT: String(await freePort()) })
}, SCRIPT_TIMEOUT)

afterAll(async () => {
  await db('destroy')
  rmSync(PRIVATE, { recursive: true, force: true })
}, SCRIPT_TIMEOUT)

describe('a checkout in a private folder', { timeout: SCRIPT_TIMEOUT }, () => {
  it('when its folder is closed to others, then its cluster starts and a migrated database is made from there', async () => {
    expect(statSync(PRIVATE).mode & 0o777).toBe(0o700)

    const started = await db('start')
    const created = await db('create', 'ambitus')
    const url = (await db('url', 'ambitus')).output.trim()
    const migrated = await runCaptured(
      process.execPath,
      ['--import', 'tsx', 'scripts/prepare-db.ts', '--no-seed'],
      { cwd: CHECKOUT, env: { ...env, DATABASE_URL: url } },
    )

    expect(started.code, started.output).toBe(0)
    expect(created.output.trim()).toBe('created')
    expect(migrated.code, migrated.output).toBe(0)
    const client = new pg.Client({ connectionString: url })
    await client.connect()
    const { rows } = await client.query('select count(*)::int as n from knex_migrations')
    await client.end()
    expect(rows[0].n).toBeGreaterThan(10)
    const status = (await db('status')).output
    expect(status).toContain(`running on 127.0.0.1:${env.PGPORT}`)
    const cluster = /cluster in (\S+)\)/.exec(status)![1]!
    // As root the postgres user runs it, outside the closed folder; a plain user runs it in .data.
    if (IS_ROOT) expect(cluster.startsWith(PRIVATE)).toBe(false)
    else expect(cluster).toBe(path.join(CHECKOUT, '.data', 'pg'))
  })

  it('when an old cluster sits inside the closed folder, then starting it says what stands in the way', async () => {
    const data = path.join(CHECKOUT, 'old-data')
    mkdirSync(path.join(data, 'pg'), { recursive: true })
    writeFileSync(path.join(data, 'pg', 'PG_VERSION'), '15\n')
    const oldEnv = { ...env, AMBITUS_DATA_DIR: data, PGPORT: String(await freePort()) }

    const started = await runScript('scripts/db.mjs', ['start'], oldEnv, CHECKOUT)

    expect(started.code).toBe(1)
    if (IS_ROOT) expect(started.output).toContain(`the postgres user, who cannot enter ${PRIVATE}`)
    else expect(started.output).toContain('PostgreSQL did not start')
  })
})
