import { randomBytes } from 'node:crypto';
import { CreateBucketCommand, DeleteObjectCommand, ListObjectsV2Command } from '@aws-sdk/client-s3';
import { createS3Client } from '../../../api/src/adapters/s3-storage.js';
import { loadStorageConfig, type S3Settings } from '../../../api/src/config.js';

/**
 * A fresh, empty bucket in the S3 fake the test runner started (scripts/src/test.ts sets S3_ENDPOINT
 * and its keys for the integration stage), named after `label`.
 */
export async function freshTestBucket(label: string): Promise<S3Settings> {
  if (!process.env.S3_ENDPOINT) {
    throw new Error(
      'S3_ENDPOINT is not set: run the integration stage through `npm run test:integration`, which starts the S3 fake.',
    );
  }
  const bucket = `${label}-${randomBytes(4).toString('hex')}`;
  const settings = loadStorageConfig({ ...process.env, S3_BUCKET: bucket, PHOTO_STORAGE: 's3' }).s3!;
  await createS3Client(settings).send(new CreateBucketCommand({ Bucket: bucket }));
  return settings;
}

/** Every object name in the bucket, sorted. */
export async function bucketNames(settings: S3Settings): Promise<string[]> {
  const client = createS3Client(settings);
  const names: string[] = [];
  let token: string | undefined;
  do {
    const page = await client.send(
      new ListObjectsV2Command({ Bucket: settings.bucket, ContinuationToken: token }),
    );
    for (const object of page.Contents ?? []) if (object.Key) names.push(object.Key);
    token = page.NextContinuationToken;
  } while (token);
  return names.sort();
}

/** Removes every object from the bucket, the owner mark included. */
export async function emptyBucket(settings: S3Settings): Promise<void> {
  const client = createS3Client(settings);
  for (const name of await bucketNames(settings))
    await client.send(new DeleteObjectCommand({ Bucket: settings.bucket, Key: name }));
}
