// db:backup and db:restore run as an operator runs them (real pg_dump and pg_restore) on a seeded
// database of their own in the local cluster, with backups in a throwaway folder.
import { mkdtempSync, readdirSync, rmSync, statSync, writeFileSync } from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import pg from 'pg'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createDatabase, dropDatabase } from '../../scripts/db.mjs'
import { databaseUrl, TEST_API_DATABASE } from '../../scripts/lib/paths.mjs'
import { prepareDatabase } from '../../scripts/lib/setup.mjs'
import { runScript, SCRIPT_TIMEOUT, scriptEnv } from '../helpers/scripts'

const DATABASE = `${TEST_API_DATABASE}_backup`
const BACKUPS = mkdtempSync(path.join(os.tmpdir(), 'ambitus-backups-'))
const env = scriptEnv({ AMBITUS_DATABASE: DATABASE, AMBITUS_BACKUP_DIR: BACKUPS })

async function query<T>(sql: string): Promise<T[]> {
  const client = new pg.Client({ connectionString: databaseUrl(DATABASE) })
  await client.connect()
  try {
    return (await client.query(sql)).rows as T[]
  } finally {
    await client.end()
  }
}

/** Every user, attempt and per-place figure of the database, in a stable order. */
async function contents() {
  const [users, attempts, items] = await Promise.all([
    query('select id, email, name, role from users order by id'),
    query('select id, user_id, correct, response_ms from attempts order by id'),
    query(
      'select user_id, drill, string, fret, attempts, correct from progress_items order by 1, 2, 3, 4',
    ),
  ])
  return { users, attempts, items }
}

/** Renames a student, deletes 5 answers and adds 3 (which the statistics queue takes in). */
async function changeEverything() {
  await query(`
    update users set name = 'Someone Else' where email = 'student@cedarhollow.test';
    delete from attempts where id in (select id from attempts order by id limit 5);
    create temp table copied as select * from attempts order by id desc limit 3;
    update copied set id = gen_random_uuid();
    insert into attempts select * from copied;`)
}

const backupsOf = (prefix = '') =>
  readdirSync(BACKUPS)
    .filter((f) => f.startsWith(`${prefix}${DATABASE}-`))
    .sort()

beforeAll(async () => {
  await dropDatabase(DATABASE)
  await createDatabase(DATABASE)
  await prepareDatabase(DATABASE) // migrated and seeded with the demo studio
}, SCRIPT_TIMEOUT)

afterAll(async () => {
  await dropDatabase(DATABASE)
  rmSync(BACKUPS, { recursive: true, force: true })
}, SCRIPT_TIMEOUT)

describe('backup and restore', { timeout: SCRIPT_TIMEOUT }, () => {
  it('when a backup is restored after the data changed, then the data is exactly as it was, and what it replaced is kept', async () => {
    const before = await contents()
    expect(before.attempts.length).toBeGreaterThan(100) // the demo history

    const backup = await runScript('scripts/backup.mjs', [], env)
    expect(backup.code, backup.output).toBe(0)
    const [file] = backupsOf()
    expect(file).toMatch(/\.dump$/)
    expect(statSync(path.join(BACKUPS, file!)).mode & 0o077).toBe(0) // private to its owner

    await changeEverything()
    const changed = await contents()
    expect(changed).not.toEqual(before)

    const restore = await runScript(
      'scripts/restore.mjs',
      [path.join(BACKUPS, file!), '--yes'],
      env,
    )
    expect(restore.code, restore.output).toBe(0)
    expect(await contents()).toEqual(before)

    const [kept] = backupsOf('before-restore-')
    const undo = await runScript('scripts/restore.mjs', [kept!, '--yes'], env)
    expect(undo.code, undo.output).toBe(0)
    expect(await contents()).toEqual(changed)
  })

  it('when a restore is not confirmed (no --yes, no terminal), then it refuses and nothing changes', async () => {
    const before = await contents()
    const backup = await runScript('scripts/backup.mjs', [], env)
    expect(backup.code, backup.output).toBe(0)
    await changeEverything()
    const changed = await contents()

    const refused = await runScript('scripts/restore.mjs', ['latest'], env)

    expect(refused.code).toBe(1)
    expect(refused.output).toContain('add --yes')
    expect(await contents()).toEqual(changed)
    expect(changed).not.toEqual(before)
  })

  it('when the file is not a backup, then a clear error and nothing changes', async () => {
    const fake = path.join(BACKUPS, 'notes.dump')
    writeFileSync(fake, 'PGDMP is how it starts, but this is not an archive')
    const before = await contents()

    const truncated = await runScript('scripts/restore.mjs', [fake, '--yes'], env)
    const text = await runScript('scripts/restore.mjs', ['package.json', '--yes'], env)

    expect(truncated.code).toBe(1)
    expect(truncated.output).toContain('pg_restore failed')
    expect(text.code).toBe(1)
    expect(text.output).toContain('is not a pg_dump custom-format archive')
    expect(await contents()).toEqual(before)
    rmSync(fake)
  })

  it('when backups pile up, then only the newest N are kept', async () => {
    for (let i = 0; i < 3; i++) {
      const run = await runScript('scripts/backup.mjs', ['--keep', '2'], env)
      expect(run.code, run.output).toBe(0)
    }
    const left = backupsOf()
    expect(left).toHaveLength(2)
    const bad = await runScript('scripts/backup.mjs', ['--keep', '0'], env)
    expect(bad.code).toBe(1)
    expect(bad.output).toContain('whole number ≥ 1')
    expect(backupsOf()).toEqual(left)
  })

  it('when DATABASE_URL names the database, then backup and restore work on it in place', async () => {
    const external = scriptEnv({ DATABASE_URL: databaseUrl(DATABASE), AMBITUS_BACKUP_DIR: BACKUPS })
    const before = await contents()
    const backup = await runScript('scripts/backup.mjs', [], external)
    expect(backup.code, backup.output).toBe(0)
    await changeEverything()

    const restore = await runScript('scripts/restore.mjs', ['latest', '--yes'], external)

    expect(restore.code, restore.output).toBe(0)
    expect(await contents()).toEqual(before)
  })
})
