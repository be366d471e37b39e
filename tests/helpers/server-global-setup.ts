// Server tests: a throwaway database in the local cluster, recreated and migrated once per run, and
// the local object store (its S3_* variables reach the test workers through process.env).
import { execFileSync } from 'node:child_process'
import path from 'node:path'
import { ensureObjectStore } from '../../scripts/fakes/s3.mjs'
import { dropDatabase, createDatabase, startCluster } from '../../scripts/db.mjs'
import { databaseUrl, ROOT, TEST_API_DATABASE, TEST_OUTPUT_DIR } from '../../scripts/lib/paths.mjs'

export default async function setup() {
  await startCluster()
  await dropDatabase(TEST_API_DATABASE)
  await createDatabase(TEST_API_DATABASE)
  execFileSync(process.execPath, ['--import', 'tsx', 'scripts/prepare-db.ts', '--no-seed'], {
    cwd: ROOT,
    env: { ...process.env, DATABASE_URL: databaseUrl(TEST_API_DATABASE) },
    stdio: 'inherit',
  })
  const store = await ensureObjectStore(path.join(TEST_OUTPUT_DIR, 'api-data'))
  Object.assign(process.env, store.env)
  return () => store.close()
}
