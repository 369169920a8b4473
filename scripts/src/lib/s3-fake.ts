/**
 * A local S3-compatible store for development and tests: s3rver (npm `s3rver`, MIT), which keeps
 * buckets as folders under `directory` and checks request signatures (SigV4) against its one
 * account. Loopback only, no TLS: never a real store.
 */
import type { AddressInfo } from 'node:net';

/** s3rver's built-in account: requests signed with other keys are refused. */
export const S3_FAKE_CREDENTIALS = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' } as const;
/** The region the fake answers for (any region signs; this one is what we send). */
export const S3_FAKE_REGION = 'us-east-1';

export interface S3FakeOptions {
  /** 0 picks a free port; the returned `port` is the real one. */
  port: number;
  host?: string;
  /** Where the buckets live (created when missing). */
  directory: string;
  /** Buckets to create at start. */
  buckets?: readonly string[];
}

export interface S3Fake {
  port: number;
  host: string;
  /** `http://host:port`: the S3_ENDPOINT to use (with S3_FORCE_PATH_STYLE=1). */
  endpoint: string;
  close(): Promise<void>;
}

/** The environment that points the API (and the AWS SDK) at a running fake. */
export function s3FakeEnv(endpoint: string, bucket?: string): Record<string, string> {
  return {
    S3_ENDPOINT: endpoint,
    S3_REGION: S3_FAKE_REGION,
    S3_FORCE_PATH_STYLE: '1',
    S3_ACCESS_KEY_ID: S3_FAKE_CREDENTIALS.accessKeyId,
    S3_SECRET_ACCESS_KEY: S3_FAKE_CREDENTIALS.secretAccessKey,
    ...(bucket ? { S3_BUCKET: bucket } : {}),
  };
}

export async function startS3Fake(options: S3FakeOptions): Promise<S3Fake> {
  const host = options.host ?? '127.0.0.1';
  // Loaded here, so the scripts that only read the settings above do not load the server.
  const { default: S3rver } = await import('s3rver');
  const server = new S3rver({
    port: options.port,
    address: host,
    directory: options.directory,
    silent: true,
    configureBuckets: (options.buckets ?? []).map((name) => ({ name, configs: [] })),
  });
  const address: AddressInfo = await server.run();
  let closing: Promise<void> | null = null;
  return {
    port: address.port,
    host,
    endpoint: `http://${host}:${address.port}`,
    close() {
      closing ??= server.close();
      return closing;
    },
  };
}
