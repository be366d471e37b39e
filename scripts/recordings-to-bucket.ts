// npm run recordings:to-bucket (also run by npm start): moves takes kept on local disk into the
// bucket named by S3_BUCKET; a no-op without one or when nothing is left on disk.
import { loadConfig } from '../server/config'
import { bucketRecordingStorage } from '../server/assignments/recording-storage-s3'
import { diskRecordingsDir } from '../server/assignments/recording-storage'
import { moveDiskTakesToBucket } from '../server/assignments/recordings-to-bucket'

const config = loadConfig(process.env, { databaseUrl: 'unused', jwtSecret: 'x'.repeat(32) })
if (config.s3) {
  const result = await moveDiskTakesToBucket(
    diskRecordingsDir(config.dataDir),
    bucketRecordingStorage(config.s3),
  )
  if (result.moved || result.alreadyThere)
    console.log(
      `[recordings] ${result.moved} takes moved into the bucket, ${result.alreadyThere} were there`,
    )
}
