import {
  CopyObjectCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadObjectCommand,
  paginateListObjectsV2,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import type { Readable } from 'node:stream';
import type { S3Settings } from '../config.js';
import {
  assertKey,
  assertKeyType,
  contentTypeOfKey,
  OWNER_MARK,
  PENDING_SUFFIX,
  readStoredName,
  type ListedObject,
  type StoredObject,
  type StrayObject,
  type SweepableStorage,
} from './storage.js';

/** How long a connection to the store may take, and a request without an answer (ms). */
const CONNECT_TIMEOUT_MS = 5_000;
const REQUEST_TIMEOUT_MS = 30_000;

/** A missing object (GET answers NoSuchKey, HEAD a bare 404 NotFound). */
function isMissing(error: unknown): boolean {
  return (
    error instanceof S3ServiceException &&
    (error.name === 'NoSuchKey' || error.name === 'NotFound' || error.$metadata.httpStatusCode === 404) &&
    error.name !== 'NoSuchBucket'
  );
}

/** The client for one bucket's settings. */
export function createS3Client(settings: S3Settings): S3Client {
  return new S3Client({
    region: settings.region,
    ...(settings.endpoint ? { endpoint: settings.endpoint } : {}),
    forcePathStyle: settings.forcePathStyle,
    ...(settings.credentials ? { credentials: settings.credentials } : {}),
    // Checksums only where the API demands them: the SDK's default (a CRC on every upload, sent
    // as a trailer) is refused or stored wrongly by several S3-compatible stores.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
    requestHandler: { connectionTimeout: CONNECT_TIMEOUT_MS, requestTimeout: REQUEST_TIMEOUT_MS },
  });
}

/**
 * Objects in one S3-compatible bucket, named by their keys (`<athlete id>/<32 hex>.<ext>`). S3 has
 * no rename: a staged object is written as `<key>.pending` and published by a server-side copy to
 * its key, then the pending object is removed; `get` never sees a pending object.
 */
export class S3Storage implements SweepableStorage {
  constructor(
    private readonly client: S3Client,
    readonly bucket: string,
  ) {}

  static fromSettings(settings: S3Settings): S3Storage {
    return new S3Storage(createS3Client(settings), settings.bucket);
  }

  get location(): string {
    return `s3://${this.bucket}`;
  }

  async put(key: string, data: Buffer, contentType: string): Promise<void> {
    assertKey(key);
    assertKeyType(key, contentType);
    await this.client.send(
      new PutObjectCommand({ Bucket: this.bucket, Key: key, Body: data, ContentType: contentType }),
    );
  }

  async stage(key: string, data: Buffer, contentType: string): Promise<void> {
    assertKey(key);
    assertKeyType(key, contentType);
    await this.client.send(
      new PutObjectCommand({
        Bucket: this.bucket,
        Key: key + PENDING_SUFFIX,
        Body: data,
        ContentType: contentType,
      }),
    );
  }

  async publish(key: string): Promise<void> {
    assertKey(key);
    try {
      await this.client.send(
        new CopyObjectCommand({
          Bucket: this.bucket,
          Key: key,
          CopySource: `${this.bucket}/${key}${PENDING_SUFFIX}`,
          ContentType: contentTypeOfKey(key),
          MetadataDirective: 'REPLACE',
        }),
      );
    } catch (error) {
      // Published already (a sweep or an earlier call): nothing left to do.
      if (isMissing(error) && (await this.exists(key))) return;
      throw error;
    }
    await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: key + PENDING_SUFFIX }));
  }

  async get(key: string): Promise<StoredObject | null> {
    assertKey(key);
    try {
      const answer = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: key }));
      return {
        // In Node the body is the response stream itself: the bytes flow on as they arrive.
        stream: answer.Body as Readable,
        size: answer.ContentLength ?? 0,
        contentType: contentTypeOfKey(key),
      };
    } catch (error) {
      if (isMissing(error)) return null;
      throw error;
    }
  }

  async delete(key: string): Promise<void> {
    assertKey(key);
    // Removing a missing object is no error in S3.
    await Promise.all(
      [key, key + PENDING_SUFFIX].map((name) =>
        this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: name })),
      ),
    );
  }

  async exists(key: string): Promise<boolean> {
    assertKey(key);
    try {
      await this.client.send(new HeadObjectCommand({ Bucket: this.bucket, Key: key }));
      return true;
    } catch (error) {
      if (isMissing(error)) return false;
      throw error;
    }
  }

  async *list(): AsyncGenerator<ListedObject | StrayObject> {
    for await (const page of paginateListObjectsV2({ client: this.client }, { Bucket: this.bucket })) {
      for (const object of page.Contents ?? []) {
        const name = object.Key;
        if (!name || name === OWNER_MARK) continue;
        const modifiedAt = object.LastModified ?? new Date(0);
        const stored = readStoredName(name);
        if (stored) yield { ...stored, modifiedAt };
        else yield { key: null, name, modifiedAt };
      }
    }
  }

  async removeStray(name: string): Promise<void> {
    if (name === OWNER_MARK || readStoredName(name)) throw new Error(`Not a stray object: ${name}`);
    await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: name }));
  }

  async readMark(): Promise<string | null> {
    try {
      const answer = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: OWNER_MARK }));
      return (await answer.Body?.transformToString('utf8')) ?? '';
    } catch (error) {
      if (isMissing(error)) return null;
      throw error;
    }
  }

  async writeMark(text: string): Promise<void> {
    if ((await this.readMark()) !== null) return;
    await this.client.send(
      new PutObjectCommand({ Bucket: this.bucket, Key: OWNER_MARK, Body: text, ContentType: 'text/plain' }),
    );
  }
}
