import { zodResolver } from '@hookform/resolvers/zod';
import type { FieldError, FieldErrors, FieldValues, Resolver } from 'react-hook-form';
import type { z } from 'zod';

/** Typed form values turned into a request body, with the boxes whose text is not a number. */
export interface RequestConversion<F extends string> {
  request: Record<string, unknown>;
  numberErrors: Partial<Record<F, string>>;
}

/**
 * A react-hook-form resolver that validates with a shared zod schema: the typed values are first
 * converted to the request body (numbers parsed, units kept as chosen), then the schema checks the
 * body. Form fields are named like the request's, so each schema message lands on its own box; a
 * box whose text is not a number says so instead. On success the form hands over the request body.
 */
export function createRequestResolver<V extends FieldValues, R>(
  schema: z.ZodType<R>,
  convert: (values: V) => RequestConversion<Extract<keyof V, string>>,
  /** Rewords a schema message of a top-level field (e.g. an SI range for a box typed in inches). */
  reword?: (field: string, error: FieldError) => string | undefined,
): Resolver<V, unknown, R> {
  const schemaResolver = zodResolver(schema as never) as unknown as Resolver<
    Record<string, unknown>,
    unknown,
    R
  >;
  return async (values, context, options) => {
    const { request, numberErrors } = convert(values);
    const result = await schemaResolver(request, context, options as never);
    const errors = { ...(result.errors as Record<string, unknown>) } as Record<string, FieldError>;
    if (reword) {
      for (const [field, error] of Object.entries(errors)) {
        if (typeof error?.message === 'string') errors[field] = { ...error, message: reword(field, error) };
      }
    }
    for (const [field, message] of Object.entries(numberErrors) as Array<[string, string]>) {
      errors[field] = { type: 'number', message, ref: options.fields?.[field]?.ref };
    }
    if (Object.keys(errors).length === 0) return { values: result.values as R, errors: {} };
    return { values: {}, errors: errors as FieldErrors<V> };
  };
}
