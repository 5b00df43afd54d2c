import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import S3rver from 's3rver'
import type { S3StorageOptions } from '../../server/files/s3-storage.js'

/** The stand-in's fixed account (s3rver's own default key pair). */
const ACCOUNT = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' }

/**
 * A local S3-compatible store (s3rver) on a free loopback port with one bucket, its objects in a temporary
 * folder; `stop()` closes it and removes the folder.
 */
export async function startLocalS3(bucket = 'loftledger-files') {
  const directory = mkdtempSync(join(tmpdir(), 'loftledger-s3-'))
  const server = new S3rver({
    address: '127.0.0.1',
    port: 0,
    silent: true,
    directory,
    configureBuckets: [{ name: bucket }],
  })
  const { port } = await server.run()
  const endpoint = `http://127.0.0.1:${port}`
  const options: S3StorageOptions = {
    bucket,
    region: 'us-east-1',
    endpoint,
    forcePathStyle: true,
    credentials: ACCOUNT,
  }
  /** The same store as the app's environment would name it. */
  const env = {
    FILE_STORAGE: 's3',
    S3_BUCKET: bucket,
    S3_ENDPOINT: endpoint,
    S3_FORCE_PATH_STYLE: 'true',
    S3_ACCESS_KEY_ID: ACCOUNT.accessKeyId,
    S3_SECRET_ACCESS_KEY: ACCOUNT.secretAccessKey,
  }
  return {
    options,
    env,
    directory,
    async stop() {
      await server.close()
      rmSync(directory, { recursive: true, force: true })
    },
  }
}
