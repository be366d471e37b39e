#!/usr/bin/env node
// npm run test:fuzz: the full hostile-body run (10,000 bodies over every JSON route, or FUZZ_BODIES)
// against PostgreSQL; npm test runs the same test with 300 so the suite stays a few minutes long.
import { run } from './lib/proc.mjs'
import { ensureDependencies } from './lib/setup.mjs'

await ensureDependencies()
const db = await import('./db.mjs')
const startedDb = await db.startCluster()
process.env.FUZZ_BODIES ??= '10000'
const code = await run(process.execPath, [
  'node_modules/vitest/vitest.mjs',
  'run',
  '--project',
  'server',
  'tests/server/security-fuzz.test.ts',
])
if (startedDb) db.stopCluster()
process.exit(code)
