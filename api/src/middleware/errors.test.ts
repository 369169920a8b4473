import { describe, expect, it } from 'vitest';
import { QueryRunnerAlreadyReleasedError } from 'typeorm';
import { z } from 'zod';
import { isDatabaseUnavailable, isStorageUnavailable, zodFields } from './errors.js';

describe('zodFields', () => {
  it('keys issues by dot-joined path, first message per path', () => {
    const schema = z.object({
      event: z.object({
        date: z.string().min(10, 'Too short'),
        limits: z.array(z.number('Must be a number')),
      }),
      name: z.string().min(1, 'Name is required').min(2, 'Second rule'),
    });
    const result = schema.safeParse({ event: { date: 'x', limits: [1, 'two'] }, name: '' });
    expect(result.success).toBe(false);
    expect(zodFields(result.error!)).toEqual({
      fields: { 'event.date': 'Too short', 'event.limits.1': 'Must be a number', name: 'Name is required' },
    });
  });

  it('keeps a root issue out of the fields', () => {
    const result = z.object({ a: z.string() }).safeParse('not an object');
    expect(zodFields(result.error!)).toEqual({ fields: {}, rootMessage: expect.any(String) });
  });
});

describe('isDatabaseUnavailable', () => {
  const withCode = (code: string, message = 'x') => Object.assign(new Error(message), { code });

  it('knows refused and reset sockets and PostgreSQL connection/shutdown SQLSTATEs', () => {
    // SQLSTATEs from the PostgreSQL manual, appendix A "PostgreSQL Error Codes".
    for (const code of [
      'ECONNREFUSED',
      'ECONNRESET',
      'ETIMEDOUT',
      '57P01',
      '57P02',
      '57P03',
      '08006',
      '53300',
    ])
      expect(isDatabaseUnavailable(withCode(code)), code).toBe(true);
  });

  it('knows the messages pg, pg-pool and TypeORM use without a code', () => {
    for (const message of [
      'Connection terminated unexpectedly',
      'Connection terminated due to connection timeout',
      'timeout exceeded when trying to connect',
      'Cannot use a pool after calling end on the pool',
      'Client has encountered a connection error and is not queryable',
    ])
      expect(isDatabaseUnavailable(new Error(message)), message).toBe(true);
  });

  it("knows TypeORM's error for a query on a runner its lost connection released", () => {
    // Thrown by typeorm's PostgresQueryRunner.query once the client's 'error' event released it.
    expect(isDatabaseUnavailable(new QueryRunnerAlreadyReleasedError())).toBe(true);
  });

  it('looks inside TypeORM driverError, cause chains and AggregateError', () => {
    const queryFailed = Object.assign(new Error('terminating connection due to administrator command'), {
      driverError: withCode('57P01'),
    });
    expect(isDatabaseUnavailable(queryFailed)).toBe(true);
    expect(isDatabaseUnavailable(new Error('outer', { cause: withCode('ECONNREFUSED') }))).toBe(true);
    expect(
      isDatabaseUnavailable(new AggregateError([withCode('ECONNREFUSED'), withCode('ECONNREFUSED')], '')),
    ).toBe(true);
  });

  it('leaves query mistakes and constraint violations as they are', () => {
    // 23505 unique_violation, 22P02 invalid_text_representation, 42P01 undefined_table.
    for (const code of ['23505', '22P02', '42P01'])
      expect(isDatabaseUnavailable(withCode(code, 'query failed')), code).toBe(false);
    expect(isDatabaseUnavailable(new Error('boom'))).toBe(false);
    expect(isDatabaseUnavailable(null)).toBe(false);
    expect(isDatabaseUnavailable('ECONNREFUSED')).toBe(false);
  });
});

describe('isStorageUnavailable', () => {
  // What @aws-sdk/client-s3 3.x throws, shapes as observed against a closed port and a failing store.
  const sdkError = (props: Record<string, unknown>) =>
    Object.assign(new Error('x'), { $metadata: { attempts: 3 } }, props);

  it('is an SDK error that means the store is unreachable or failing', () => {
    expect(isStorageUnavailable(sdkError({ code: 'ECONNREFUSED' }))).toBe(true);
    expect(isStorageUnavailable(sdkError({ name: 'TimeoutError' }))).toBe(true);
    expect(isStorageUnavailable(sdkError({ name: 'SlowDown', $metadata: { httpStatusCode: 503 } }))).toBe(
      true,
    );
    expect(
      isStorageUnavailable(sdkError({ name: 'InternalError', $metadata: { httpStatusCode: 500 } })),
    ).toBe(true);
  });

  it('is not a missing key, a refusal, or an error from anything but the SDK', () => {
    expect(isStorageUnavailable(sdkError({ name: 'NoSuchKey', $metadata: { httpStatusCode: 404 } }))).toBe(
      false,
    );
    expect(isStorageUnavailable(sdkError({ name: 'AccessDenied', $metadata: { httpStatusCode: 403 } }))).toBe(
      false,
    );
    expect(isStorageUnavailable(Object.assign(new Error('x'), { code: 'ECONNREFUSED' }))).toBe(false);
    expect(isStorageUnavailable(null)).toBe(false);
  });
});
