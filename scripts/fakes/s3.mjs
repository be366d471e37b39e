// The local object store: s3rver on 127.0.0.1 (a free port unless S3_PORT names one), its files under
// the data folder, the recordings bucket created at start. Real S3 is used when S3_ENDPOINT is set.
import { mkdirSync } from 'node:fs'
import path from 'node:path'
import S3rver from 's3rver'
import { freePort, log } from '../lib/proc.mjs'

// s3rver's fixed local key pair: public knowledge, valid only against the local fake.
const FAKE_KEY = 'S3RVER'
const BUCKET = 'ambitus-recordings'

/**
 * The environment that points the app at object storage: `env` unchanged when S3_ENDPOINT is set
 * (real storage, credentials from the environment), else a local s3rver started under `dataDir`.
 * Resolves to { env, close }.
 */
export async function ensureObjectStore(dataDir, env = process.env) {
  if (env.S3_ENDPOINT) return { env: { ...env }, close: async () => {} }
  const directory = path.join(dataDir, 's3')
  mkdirSync(directory, { recursive: true, mode: 0o700 })
  const port = Number(env.S3_PORT ?? 0) || (await freePort())
  const bucket = env.S3_BUCKET ?? BUCKET
  const server = new S3rver({
    address: '127.0.0.1',
    port,
    directory,
    silent: true,
    configureBuckets: [{ name: bucket }],
  })
  await server.run()
  log('s3', `local object store on http://127.0.0.1:${port} (bucket ${bucket})`)
  return {
    env: {
      ...env,
      S3_ENDPOINT: `http://127.0.0.1:${port}`,
      S3_BUCKET: bucket,
      S3_REGION: env.S3_REGION ?? 'us-east-1',
      AWS_ACCESS_KEY_ID: FAKE_KEY,
      AWS_SECRET_ACCESS_KEY: FAKE_KEY,
      // The SDK's notice about future Node versions; the pinned SDK runs on Node 20 (STACK.md).
      AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true',
    },
    close: () => server.close(),
  }
}
