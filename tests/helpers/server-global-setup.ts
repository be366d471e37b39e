// Server tests: a throwaway database in the local cluster, recreated and migrated once per run.
import { execFileSync } from 'node:child_process'
import { dropDatabase, createDatabase, startCluster } from '../../scripts/db.mjs'
import { databaseUrl, ROOT, TEST_API_DATABASE } from '../../scripts/lib/paths.mjs'

export default async function setup() {
  await startCluster()
  await dropDatabase(TEST_API_DATABASE)
  await createDatabase(TEST_API_DATABASE)
  execFileSync(process.execPath, ['--import', 'tsx', 'scripts/prepare-db.ts', '--no-seed'], {
    cwd: ROOT,
    env: { ...process.env, DATABASE_URL: databaseUrl(TEST_API_DATABASE) },
    stdio: 'inherit',
  })
}
