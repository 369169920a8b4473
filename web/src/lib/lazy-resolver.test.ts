import { signInRequest, type SignInRequest } from '@driftmark/shared';
import { zodResolver } from '@hookform/resolvers/zod';
import type { Resolver, ResolverOptions } from 'react-hook-form';
import { describe, expect, it } from 'vitest';
import { lazyResolver } from './lazy-resolver';

const options = {
  fields: {},
  shouldUseNativeValidation: false,
} as unknown as ResolverOptions<SignInRequest>;

describe('lazyResolver', () => {
  it('answers as the schema resolver itself does, loading it once', async () => {
    let loads = 0;
    const direct = zodResolver(signInRequest);
    const lazy = lazyResolver<SignInRequest, SignInRequest>(() => {
      loads += 1;
      return Promise.resolve(direct as Resolver<SignInRequest, unknown, SignInRequest>);
    });
    lazy.preload();
    for (const values of [
      { email: ' Ana@Example.TEST ', password: 'secret' },
      { email: 'not an address', password: '' },
    ]) {
      expect(await lazy(values, undefined, options)).toEqual(await direct(values, undefined, options));
    }
    expect(loads).toBe(1);
  });

  it('tries the load again on the next submit after a failed one', async () => {
    let loads = 0;
    const lazy = lazyResolver<SignInRequest, SignInRequest>(() => {
      loads += 1;
      if (loads === 1) return Promise.reject(new Error('chunk failed to load'));
      return Promise.resolve(zodResolver(signInRequest) as Resolver<SignInRequest, unknown, SignInRequest>);
    });
    const values = { email: 'ana@example.test', password: 'secret' };
    await expect(lazy(values, undefined, options)).rejects.toThrow('chunk failed to load');
    const result = await lazy(values, undefined, options);
    expect(result.errors).toEqual({});
    expect(result.values).toEqual(values);
    expect(loads).toBe(2);
  });
});
