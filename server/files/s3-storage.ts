import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadObjectCommand,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3'
import { checkStorageKey, type FileStorage } from './file-storage.js'

/** Where an S3-compatible object store is and how to sign in to it. */
export interface S3StorageOptions {
  bucket: string
  region: string
  /** Another S3-compatible service (a self-hosted store); absent for Amazon S3 itself. */
  endpoint?: string
  /** Bucket in the path rather than the host name, as most self-hosted stores want. */
  forcePathStyle?: boolean
  /** Absent: the SDK's own chain (environment, shared files, instance role). */
  credentials?: { accessKeyId: string; secretAccessKey: string }
  /** Put before every key, so one bucket can hold several venues' installations. */
  keyPrefix?: string
}

const isMissing = (error: unknown) =>
  error instanceof S3ServiceException &&
  (error.name === 'NoSuchKey' || error.name === 'NotFound' || error.$metadata.httpStatusCode === 404)

/** Files as objects in one bucket of an S3-compatible store; an object is written whole or not at all. */
export function s3Storage(options: S3StorageOptions, client = s3Client(options)): FileStorage {
  const prefix = options.keyPrefix ? options.keyPrefix.replace(/\/*$/, '/') : ''
  const target = (key: string) => ({ Bucket: options.bucket, Key: prefix + checkStorageKey(key) })
  return {
    async put(key, bytes, contentType) {
      await client.send(new PutObjectCommand({ ...target(key), Body: bytes, ContentType: contentType }))
    },
    async get(key) {
      try {
        const answer = await client.send(new GetObjectCommand(target(key)))
        return answer.Body ? Buffer.from(await answer.Body.transformToByteArray()) : Buffer.alloc(0)
      } catch (error) {
        if (isMissing(error)) return null
        throw error
      }
    },
    async delete(key) {
      await client.send(new DeleteObjectCommand(target(key)))
    },
    async exists(key) {
      try {
        await client.send(new HeadObjectCommand(target(key)))
        return true
      } catch (error) {
        if (isMissing(error)) return false
        throw error
      }
    },
  }
}

/** The SDK client; checksums only where a request needs them, since not every S3-compatible store speaks them. */
export function s3Client(options: S3StorageOptions) {
  return new S3Client({
    region: options.region,
    endpoint: options.endpoint,
    forcePathStyle: options.forcePathStyle,
    credentials: options.credentials,
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  })
}
