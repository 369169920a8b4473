import type { FieldValues, Resolver } from 'react-hook-form';

export interface LazyResolver<V extends FieldValues, T> extends Resolver<V, unknown, T> {
  /** Starts loading the real resolver (call it once the form is on screen). */
  preload: () => void;
}

/**
 * A react-hook-form resolver whose schema loads in its own chunk: the form draws without zod and
 * the shared schemas, which arrive while the reader types (`preload`) and validate from the first
 * submit on. The resolver itself is the same schema resolver the other forms use.
 */
export function lazyResolver<V extends FieldValues, T>(
  load: () => Promise<Resolver<V, unknown, T>>,
): LazyResolver<V, T> {
  let loading: Promise<Resolver<V, unknown, T>> | undefined;
  const get = () => {
    loading ??= load().catch((error: unknown) => {
      loading = undefined; // a failed chunk load is tried again on the next submit
      throw error;
    });
    return loading;
  };
  const resolver: Resolver<V, unknown, T> = async (values, context, options) =>
    (await get())(values, context, options);
  return Object.assign(resolver, { preload: () => void get().catch(() => undefined) });
}
